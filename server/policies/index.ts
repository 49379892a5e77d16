import type { SessionUser } from '../auth/passport';
import type { Role } from '@shared/schemas/auth';
import { forbidden, unauthenticated } from '../errors';

export type Actor = SessionUser | null | undefined;

const rank: Record<Role, number> = { reader: 0, contributor: 1, editor: 2, admin: 3 };

/** True when the actor is signed in with at least the given role (admin ⊃ editor ⊃ contributor ⊃ reader). */
export function atLeast(actor: Actor, role: Role): actor is SessionUser {
  return !!actor && rank[actor.role] >= rank[role];
}

export const isSignedIn = (actor: Actor): actor is SessionUser => !!actor;

/**
 * Throws unless `allowed`: 401 for an anonymous actor (sign in might help), 403 otherwise.
 * Every route decides through a policy function and then calls this.
 */
export function authorize(actor: Actor, allowed: boolean, message?: string): asserts actor is SessionUser {
  if (allowed && actor) return;
  if (allowed) return;
  if (!actor) throw unauthenticated();
  throw forbidden(message);
}

/** Route-level guard for actions that need no record, e.g. `allow(userPolicy.list)`. */
export function allow(rule: (actor: Actor) => boolean, message?: string) {
  return (req: { user?: SessionUser }, _res: unknown, next: (error?: unknown) => void) => {
    try {
      authorize(req.user, rule(req.user), message);
      next();
    } catch (error) {
      next(error);
    }
  };
}
