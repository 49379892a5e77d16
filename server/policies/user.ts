import type { User } from '../models';
import { atLeast, type Actor } from './index';

export const userPolicy = {
  list: (actor: Actor) => atLeast(actor, 'admin'),
  /** Admins manage others; nobody changes their own role or deactivates themself (no lock-out). */
  update: (actor: Actor, target: User) => atLeast(actor, 'admin') && actor.id !== target.id,
  invite: (actor: Actor) => atLeast(actor, 'admin'),
};
