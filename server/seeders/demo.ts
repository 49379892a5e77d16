import { User } from '../models';
import { hashPassword } from '../auth/password';
import { seedInstrumentSizes } from './sizes';
import { seedDemoCatalogue } from './demo-catalogue';
import type { Role } from '@shared/schemas/auth';

export const demoAccounts: { role: Role; email: string; displayName: string }[] = [
  { role: 'reader', email: 'reader@demo.windway.invalid', displayName: 'Ottilie Brandscombe (demo reader)' },
  { role: 'contributor', email: 'contributor@demo.windway.invalid', displayName: 'Jasper Quennell (demo contributor)' },
  { role: 'editor', email: 'editor@demo.windway.invalid', displayName: 'Mirela Havelund (demo editor)' },
  { role: 'admin', email: 'admin@demo.windway.invalid', displayName: 'Teodor Falkmann (demo admin)' },
];

/**
 * The fictional demo world, seeded idempotently: running it again changes nothing
 * that exists (passwords of demo accounts follow the local secrets file).
 */
export async function seedDemo(passwords: Record<Role, string>, log: (line: string) => void = () => {}): Promise<void> {
  for (const account of demoAccounts) {
    const existing = await User.findOne({ where: { email: account.email } });
    if (existing) continue;
    await User.create({ ...account, passwordHash: await hashPassword(passwords[account.role]), emailVerifiedAt: new Date() });
    log(`Created demo ${account.role} account ${account.email}`);
  }
  await seedInstrumentSizes();
  const contributor = await User.findOne({ where: { email: demoAccounts[1].email } });
  const editor = await User.findOne({ where: { email: demoAccounts[2].email } });
  if (contributor && editor) await seedDemoCatalogue({ contributor, editor }, log);
}
