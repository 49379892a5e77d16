import { Session, User } from '../models';
import { getSequelize } from '../db';
import { hashPassword } from '../auth/password';
import { issueToken, consumeToken } from './user-tokens';
import { sendMail } from '../mail/mailer';
import { mailTemplates } from '../mail/templates';
import { publicUrl } from '../config';
import { badRequest, conflict } from '../errors';
import type { Role } from '@shared/schemas/auth';

export const normaliseEmail = (email: string) => email.trim().toLowerCase();

/** Registration always creates a reader; the verification mail goes out after commit. */
export async function registerReader(input: { email: string; displayName: string; password: string }): Promise<User> {
  const email = normaliseEmail(input.email);
  if (await User.findOne({ where: { email } })) {
    throw conflict('An account with this e-mail address exists already. Sign in or reset the password.', {
      email: 'This address is already registered.',
    });
  }
  const passwordHash = await hashPassword(input.password);
  const { user, token } = await getSequelize().transaction(async (transaction) => {
    const created = await User.create(
      { email, displayName: input.displayName.trim(), passwordHash, role: 'reader', emailVerifiedAt: null },
      { transaction },
    );
    return { user: created, token: await issueToken(created.id, 'verify', transaction) };
  });
  await sendMail(user.email, mailTemplates.verifyEmail(user.displayName, `${publicUrl()}/verify-email?token=${token}`));
  return user;
}

export async function verifyEmail(token: string): Promise<void> {
  await getSequelize().transaction(async (transaction) => {
    const userId = await consumeToken(token, 'verify', transaction);
    if (!userId) throw badRequest('This confirmation link is invalid or has expired.', { token: 'Ask for a new link.' });
    await User.update({ emailVerifiedAt: new Date() }, { where: { id: userId }, transaction });
  });
}

/** Answers the same whether or not the address is known, so accounts cannot be discovered. */
export async function requestPasswordReset(email: string): Promise<void> {
  const user = await User.findOne({ where: { email: normaliseEmail(email), active: true } });
  if (!user) return;
  const token = await issueToken(user.id, 'reset');
  await sendMail(user.email, mailTemplates.passwordReset(user.displayName, `${publicUrl()}/reset-password?token=${token}`));
}

/** Sets the new password, uses up the token and ends every session of the account. */
export async function confirmPasswordReset(token: string, password: string): Promise<void> {
  const passwordHash = await hashPassword(password);
  await getSequelize().transaction(async (transaction) => {
    const userId = (await consumeToken(token, 'reset', transaction)) ?? (await consumeToken(token, 'invite', transaction));
    if (!userId) throw badRequest('This reset link is invalid, used or expired. Ask for a new one.', { token: 'Ask for a new link.' });
    await User.update({ passwordHash, emailVerifiedAt: new Date() }, { where: { id: userId }, transaction });
    await Session.destroy({ where: { userId }, transaction });
  });
}

/** An admin invites someone with a role; the link lets them choose a password. */
export async function inviteUser(inviter: { displayName: string }, input: { email: string; displayName: string; role: Role }): Promise<User> {
  const email = normaliseEmail(input.email);
  if (await User.findOne({ where: { email } })) throw conflict('This address already has an account.', { email: 'Already registered.' });
  const unusable = await hashPassword(crypto.randomUUID() + crypto.randomUUID());
  const { user, token } = await getSequelize().transaction(async (transaction) => {
    const created = await User.create(
      { email, displayName: input.displayName.trim(), passwordHash: unusable, role: input.role, emailVerifiedAt: null },
      { transaction },
    );
    return { user: created, token: await issueToken(created.id, 'invite', transaction) };
  });
  await sendMail(email, mailTemplates.invitation(inviter.displayName, input.role, `${publicUrl()}/reset-password?token=${token}&invited=1`));
  return user;
}
