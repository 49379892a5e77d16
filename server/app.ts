import express, { type Express } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { getConfig } from './config';
import { getSequelize } from './db';
import { hasSessionCookie, sessionMiddleware } from './http/session';
import { requireCsrfToken, SAFE_METHODS } from './http/csrf';
import { errorHandler } from './http/error-handler';
import { configurePassport } from './auth/passport';
import { apiRouter } from './routes';
import { oaiRouter } from './routes/open-standards/oai';
import { healthRouter } from './routes/health';

const clientDir = resolve(import.meta.dirname, '../dist');

/** The Express app: security headers, body parsing, sessions, CSRF, the API, and the built client. */
export function createApp(): Express {
  const config = getConfig();
  const app = express();
  app.disable('x-powered-by');
  if (config.TRUST_PROXY === '1') app.set('trust proxy', 1);

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          // pdf.js runs its worker from our own origin (a module worker built by Vite).
          workerSrc: ["'self'", 'blob:'],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          connectSrc: ["'self'"],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  app.use(express.json({ limit: '1mb' }));
  app.use(express.urlencoded({ extended: false, limit: '100kb' }));

  // Harvesters POST read-only OAI-PMH queries without sessions, so it sits before sessions and CSRF.
  app.use('/oai', oaiRouter());
  // Health needs no session: answered before the session store, so it still reports
  // `db: 'down'` (not a generic 503) when MariaDB, which holds the sessions, is away.
  app.use('/api/health', healthRouter());

  const sequelize = getSequelize();
  const passport = configurePassport();
  const loadSession = sessionMiddleware(sequelize, config);
  const restoreUser = passport.session();
  app.use((req, res, next) => {
    // A read without a session cookie has no session to restore and makes none (only
    // GET /api/auth/me starts one, for its CSRF token): skip building one to throw away.
    if (SAFE_METHODS.has(req.method) && req.path !== '/api/auth/me' && !hasSessionCookie(req)) return next();
    loadSession(req, res, (error?: unknown) => (error ? next(error) : restoreUser(req, res, next)));
  });
  app.use(requireCsrfToken);

  app.use('/api', apiRouter());

  if (existsSync(clientDir)) {
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }));
    app.get(/^(?!\/api\/).*/, (_req, res) => res.sendFile(resolve(clientDir, 'index.html')));
  }

  app.use(errorHandler);
  return app;
}
