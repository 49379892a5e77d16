import type { ApiErrorCode } from '@shared/api/errors';

/** An error that maps to the public error contract: `{ error: { code, message, fields? } }`. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: ApiErrorCode,
    message: string,
    readonly fields?: Record<string, string>,
  ) {
    super(message);
    this.name = 'HttpError';
  }
}

export const badRequest = (message: string, fields?: Record<string, string>) =>
  new HttpError(400, 'bad_request', message, fields);
export const invalid = (fields: Record<string, string>, message = 'Some fields need fixing.') =>
  new HttpError(400, 'validation_failed', message, fields);
export const unauthenticated = (message = 'Sign in to do this.') => new HttpError(401, 'unauthenticated', message);
export const forbidden = (message = 'You are not allowed to do this.') => new HttpError(403, 'forbidden', message);
export const notFound = (what = 'That item') => new HttpError(404, 'not_found', `${what} was not found.`);
export const conflict = (message: string, fields?: Record<string, string>) =>
  new HttpError(409, 'conflict', message, fields);
export const payloadTooLarge = (message: string) => new HttpError(413, 'payload_too_large', message);
export const unsupportedMediaType = (message: string) => new HttpError(415, 'unsupported_media_type', message);
export const rateLimited = (message: string) => new HttpError(429, 'rate_limited', message);
export const unavailable = (message: string) => new HttpError(503, 'unavailable', message);
