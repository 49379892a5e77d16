import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import type { Sequelize } from 'sequelize';
import type { Config } from '../config';

const SequelizeStore = connectSessionSequelize(session.Store);

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export const SESSION_COOKIE = 'windway.sid';

/** Sessions live in MariaDB so app processes stay stateless and survive restarts. */
export function sessionMiddleware(sequelize: Sequelize, config: Config) {
  const store = new SequelizeStore({
    db: sequelize,
    table: 'Session',
    checkExpirationInterval: 15 * 60 * 1000,
    expiration: 14 * 24 * 60 * 60 * 1000,
    extendDefaultFields: (defaults: { data: string; expires: Date }, sess: { passport?: { user?: number } }) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: sess.passport?.user ?? null,
    }),
  });
  return session({
    name: SESSION_COOKIE,
    secret: config.SESSION_SECRET,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    proxy: config.TRUST_PROXY === '1',
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      // Secure whenever the request arrived over TLS (directly or via a trusted proxy).
      secure: 'auto',
      maxAge: 14 * 24 * 60 * 60 * 1000,
    },
  });
}
