import { Router, type Request } from 'express';
import { rateLimit, ipKeyGenerator } from 'express-rate-limit';
import type { SessionResponse, AuthResponse } from '@shared/schemas/auth';
import {
  loginSchema,
  passwordResetConfirmSchema,
  passwordResetRequestSchema,
  registerSchema,
} from '@shared/schemas/auth';
import { verifyEmailSchema } from '@shared/schemas/users';
import { validate } from '../../http/validate';
import { csrfTokenFor, rotateCsrfToken } from '../../http/csrf';
import { configurePassport, toSessionUser, type SessionUser } from '../../auth/passport';
import { HttpError, rateLimited } from '../../errors';
import { User } from '../../models';
import { presentUser } from '../../presenters/user';
import { confirmPasswordReset, registerReader, requestPasswordReset, verifyEmail } from '../../services/accounts';
import { getConfig } from '../../config';
import { SESSION_COOKIE } from '../../http/session';

/** Regenerates the session id at sign-in (OWASP ASVS 3.2.1) and logs the user in. */
function signIn(req: Request, user: SessionUser): Promise<void> {
  return new Promise((resolve, reject) =>
    req.session.regenerate((error) => {
      if (error) return reject(error);
      req.login(user, (loginError) => (loginError ? reject(loginError) : resolve()));
    }),
  );
}

async function authResponse(req: Request, user: User): Promise<AuthResponse> {
  const csrfToken = rotateCsrfToken(req);
  await new Promise<void>((resolve, reject) => req.session.save((e) => (e ? reject(e) : resolve())));
  return { user: presentUser(user), csrfToken };
}

export function authRouter(): Router {
  const router = Router();
  const passport = configurePassport();
  const config = getConfig();

  // Throttles by address and account together, so one person cannot lock out another's account from elsewhere.
  const loginLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: config.LOGIN_MAX_ATTEMPTS,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    keyGenerator: (req) => `${ipKeyGenerator(req.ip ?? '')}|${String(req.body?.email ?? '').trim().toLowerCase()}`,
    handler: (_req, _res, next) => next(rateLimited('Too many sign-in attempts. Wait 15 minutes, or reset your password.')),
  });
  const mailLimiter = rateLimit({
    windowMs: 15 * 60 * 1000,
    limit: 20,
    standardHeaders: 'draft-7',
    legacyHeaders: false,
    handler: (_req, _res, next) => next(rateLimited('Too many requests. Wait a few minutes.')),
  });

  router.get('/me', async (req, res) => {
    const user = req.user ? await User.findByPk(req.user.id) : null;
    const body: SessionResponse = {
      user: user ? presentUser(user) : null,
      csrfToken: csrfTokenFor(req),
      demo: config.DEMO === '1',
      mailCapture: !!config.MAIL_CAPTURE_DIR,
    };
    res.set('Cache-Control', 'no-store').json(body);
  });

  router.post('/register', mailLimiter, validate({ body: registerSchema }), async (req, res) => {
    const user = await registerReader(req.body);
    await signIn(req, toSessionUser(user));
    res.status(201).json(await authResponse(req, user));
  });

  router.post('/login', loginLimiter, validate({ body: loginSchema }), (req, res, next) => {
    passport.authenticate('local', { session: false }, async (error: unknown, user: SessionUser | false) => {
      try {
        if (error) throw error;
        if (!user) throw new HttpError(401, 'unauthenticated', 'The e-mail address or password is not right.');
        await signIn(req, user);
        const record = await User.findByPk(user.id);
        res.json(await authResponse(req, record!));
      } catch (failure) {
        next(failure);
      }
    })(req, res, next);
  });

  router.post('/logout', (req, res, next) => {
    req.logout((error) => {
      if (error) return next(error);
      req.session.destroy((destroyError) => {
        if (destroyError) return next(destroyError);
        res.clearCookie(SESSION_COOKIE).status(204).end();
      });
    });
  });

  router.post('/password-reset', mailLimiter, validate({ body: passwordResetRequestSchema }), async (req, res) => {
    await requestPasswordReset(req.body.email);
    res.status(202).json({ message: 'If an account uses this address, a reset link is on its way.' });
  });

  router.post('/password-reset/confirm', mailLimiter, validate({ body: passwordResetConfirmSchema }), async (req, res) => {
    await confirmPasswordReset(req.body.token, req.body.password);
    res.status(204).end();
  });

  router.post('/verify-email', validate({ body: verifyEmailSchema }), async (req, res) => {
    await verifyEmail(req.body.token);
    res.status(204).end();
  });

  return router;
}
