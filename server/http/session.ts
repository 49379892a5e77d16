import session from 'express-session';
import connectSessionSequelize from 'connect-session-sequelize';
import type { Sequelize } from 'sequelize';
import { LRUCache } from 'lru-cache';
import type { Config } from '../config';

const SequelizeStore = connectSessionSequelize(session.Store);

/** How long a session's stored expiry may lag behind its (rolling) cookie: a fortnight's sessions lose nothing. */
const TOUCH_EVERY_MS = 10 * 60 * 1000;

type Store = InstanceType<typeof SequelizeStore>;

/**
 * With `rolling`, express-session touches the store after every response, so a signed-in
 * reader's every page view would be an UPDATE (and a commit) in MariaDB. This writes the new
 * expiry at most every TOUCH_EVERY_MS per session and process; saves go through as before.
 */
function throttleTouches(store: Store): Store {
  const lastWrite = new LRUCache<string, number>({ max: 50_000 });
  const { touch, set, destroy } = { touch: store.touch.bind(store), set: store.set.bind(store), destroy: store.destroy.bind(store) };
  store.touch = (sid, data, callback) => {
    const last = lastWrite.get(sid);
    if (last !== undefined && Date.now() - last < TOUCH_EVERY_MS) return callback?.(null);
    lastWrite.set(sid, Date.now());
    touch(sid, data, callback);
  };
  store.set = (sid, data, callback) => {
    lastWrite.set(sid, Date.now());
    set(sid, data, callback);
  };
  store.destroy = (sid, callback) => {
    lastWrite.delete(sid);
    destroy(sid, callback);
  };
  return store;
}

declare module 'express-session' {
  interface SessionData {
    csrfToken?: string;
  }
}

export const SESSION_COOKIE = 'windway.sid';

/** Whether the request carries Windway's session cookie (by name; express-session checks its signature). */
export function hasSessionCookie(req: { headers: { cookie?: string } }): boolean {
  return (req.headers.cookie ?? '').split(';').some((pair) => pair.trim().startsWith(`${SESSION_COOKIE}=`));
}

/** Sessions live in MariaDB so app processes stay stateless and survive restarts. */
export function sessionMiddleware(sequelize: Sequelize, config: Config) {
  const store = throttleTouches(new SequelizeStore({
    db: sequelize,
    table: 'Session',
    checkExpirationInterval: 15 * 60 * 1000,
    expiration: 14 * 24 * 60 * 60 * 1000,
    extendDefaultFields: (defaults: { data: string; expires: Date }, sess: { passport?: { user?: number } }) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: sess.passport?.user ?? null,
    }),
  }));
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
