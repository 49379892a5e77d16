import type { PublicUser } from '@shared/schemas/auth';
import type { User } from '../models';

export function presentUser(user: User): PublicUser {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    role: user.role,
    active: user.active,
    emailVerifiedAt: user.emailVerifiedAt ? user.emailVerifiedAt.toISOString() : null,
    createdAt: user.createdAt.toISOString(),
  };
}

/** What other people may see of a user: a name to credit, nothing else. */
export function presentCredit(user: Pick<User, 'id' | 'displayName'> | null | undefined) {
  return user ? { id: user.id, displayName: user.displayName } : null;
}
