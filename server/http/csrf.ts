import { randomBytes, timingSafeEqual } from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { HttpError } from '../errors';

export const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);
export const CSRF_HEADER = 'x-csrf-token';

/** The synchronizer token of this session, created on first use (OWASP CSRF Prevention Cheat Sheet). */
export function csrfTokenFor(req: Request): string {
  req.session.csrfToken ??= randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

export function rotateCsrfToken(req: Request): string {
  req.session.csrfToken = randomBytes(32).toString('base64url');
  return req.session.csrfToken;
}

/** Every state-changing request must echo the session's token in the X-CSRF-Token header. */
export const requireCsrfToken: RequestHandler = (req, _res, next) => {
  if (SAFE_METHODS.has(req.method)) return next();
  const sent = req.get(CSRF_HEADER);
  const expected = req.session?.csrfToken;
  if (!sent || !expected || sent.length !== expected.length || !timingSafeEqual(Buffer.from(sent), Buffer.from(expected))) {
    return next(
      new HttpError(403, 'csrf_invalid', 'This form has expired or was sent from elsewhere. Reload the page and try again.'),
    );
  }
  next();
};
