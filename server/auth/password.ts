import { availableParallelism } from 'node:os';
import { hash, verify } from '@node-rs/argon2';
import pLimit from 'p-limit';

// OWASP Password Storage Cheat Sheet: argon2id, m=19 MiB, t=2, p=1.
const options = { algorithm: 2 /* Algorithm.Argon2id (a const enum) */, memoryCost: 19_456, timeCost: 2, parallelism: 1 };

/**
 * Hashes run on libuv's thread pool (4 threads by default). Unbounded, a burst of sign-ins
 * takes every core from the event loop and every other request waits; with fewer hashes than
 * cores at once, sign-ins queue instead. One per core measured best (`npm run load`).
 */
const oneHashPerCore = pLimit(Math.max(1, availableParallelism()));

export function hashPassword(password: string): Promise<string> {
  return oneHashPerCore(() => hash(password, options));
}

export async function verifyPassword(passwordHash: string, password: string): Promise<boolean> {
  try {
    return await oneHashPerCore(() => verify(passwordHash, password));
  } catch {
    return false;
  }
}

/** A hash to verify against when the e-mail is unknown, so timing does not reveal accounts. */
let dummyHash: Promise<string> | undefined;
export function dummyPasswordHash(): Promise<string> {
  dummyHash ??= hashPassword('not-a-real-password-for-timing-only');
  return dummyHash;
}
