import { createHash, randomBytes } from 'node:crypto';
import { Op, type Transaction } from 'sequelize';
import { PasswordReset } from '../models';

type Purpose = PasswordReset['purpose'];

const lifetimes: Record<Purpose, number> = {
  reset: 60 * 60 * 1000,
  verify: 48 * 60 * 60 * 1000,
  invite: 7 * 24 * 60 * 60 * 1000,
};

const digest = (token: string) => createHash('sha256').update(token).digest('hex');

/** Issues a random single-use token; only its SHA-256 is stored. */
export async function issueToken(userId: number, purpose: Purpose, transaction?: Transaction): Promise<string> {
  const token = randomBytes(32).toString('base64url');
  await PasswordReset.create(
    { userId, purpose, tokenHash: digest(token), expiresAt: new Date(Date.now() + lifetimes[purpose]), usedAt: null },
    { transaction },
  );
  return token;
}

/** Marks a valid token used and returns its user id, or null when unknown, used or expired. */
export async function consumeToken(token: string, purpose: Purpose, transaction: Transaction): Promise<number | null> {
  const row = await PasswordReset.findOne({
    where: { tokenHash: digest(token), purpose, usedAt: null, expiresAt: { [Op.gt]: new Date() } },
    transaction,
    lock: transaction.LOCK.UPDATE,
  });
  if (!row) return null;
  await row.update({ usedAt: new Date() }, { transaction });
  return row.userId;
}
