import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { User } from '../models';
import type { Role } from '@shared/schemas/auth';
import { dummyPasswordHash, verifyPassword } from './password';

export interface SessionUser {
  id: number;
  role: Role;
  displayName: string;
  email: string;
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // passport's `req.user`
    interface User extends SessionUser {}
  }
}

let configured = false;

/** Sign-in by e-mail and password; only the user id is kept in the session. */
export function configurePassport(): typeof passport {
  if (configured) return passport;
  configured = true;
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, async (email, password, done) => {
      try {
        const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
        const ok = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), password);
        if (!user || !ok || !user.active) return done(null, false);
        return done(null, toSessionUser(user));
      } catch (error) {
        return done(error);
      }
    }),
  );
  passport.serializeUser((user, done) => done(null, user.id));
  passport.deserializeUser(async (id: number, done) => {
    try {
      const user = await User.findByPk(id);
      // A deactivated account loses its sessions at the next request.
      done(null, user && user.active ? toSessionUser(user) : false);
    } catch (error) {
      done(error);
    }
  });
  return passport;
}

export function toSessionUser(user: User): SessionUser {
  return { id: user.id, role: user.role, displayName: user.displayName, email: user.email };
}
