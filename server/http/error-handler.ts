import type { ErrorRequestHandler, RequestHandler } from 'express';
import { BaseError, ConnectionError, UniqueConstraintError, ValidationError as SequelizeValidationError } from 'sequelize';
import { MulterError } from 'multer';
import { HttpError, notFound } from '../errors';
import type { ApiErrorBody } from '@shared/api/errors';

export const apiNotFound: RequestHandler = (req, _res, next) => next(notFound(`The API route ${req.method} ${req.path}`));

/** Maps every error to the public error contract; clients never see a stack trace. */
export const errorHandler: ErrorRequestHandler = (error, req, res, _next) => {
  const mapped = toHttpError(error);
  if (mapped.status >= 500) console.error(`[${req.method} ${req.originalUrl}]`, error);
  if (res.headersSent) return;
  const body: ApiErrorBody = { error: { code: mapped.code, message: mapped.message } };
  if (mapped.fields && Object.keys(mapped.fields).length > 0) body.error.fields = mapped.fields;
  res.status(mapped.status).json(body);
};

function toHttpError(error: unknown): HttpError {
  if (error instanceof HttpError) return error;
  if (error instanceof MulterError) {
    if (error.code === 'LIMIT_FILE_SIZE') return new HttpError(413, 'payload_too_large', 'The file is larger than the upload limit.');
    return new HttpError(400, 'bad_request', `Upload refused: ${error.message}.`, error.field ? { [error.field]: error.message } : undefined);
  }
  if (error instanceof UniqueConstraintError) {
    const fields = Object.fromEntries(error.errors.map((e) => [e.path ?? '_', `This ${e.path ?? 'value'} is already in use.`]));
    return new HttpError(409, 'conflict', 'A record with the same value already exists.', fields);
  }
  if (error instanceof SequelizeValidationError) {
    const fields = Object.fromEntries(error.errors.map((e) => [e.path ?? '_', e.message]));
    return new HttpError(400, 'validation_failed', 'Some fields need fixing.', fields);
  }
  if (error instanceof ConnectionError || isDatabaseDown(error)) {
    return new HttpError(503, 'unavailable', 'The database is not answering. Try again in a moment.');
  }
  const status = (error as { status?: number; statusCode?: number })?.status ?? (error as { statusCode?: number })?.statusCode;
  const type = (error as { type?: string })?.type;
  if (status === 413 || type === 'entity.too.large') return new HttpError(413, 'payload_too_large', 'The request body is too large.');
  if (type === 'entity.parse.failed') return new HttpError(400, 'bad_request', 'The request body is not valid JSON.');
  if (status && status >= 400 && status < 500) return new HttpError(status, 'bad_request', 'The request could not be understood.');
  if (error instanceof BaseError && isDatabaseDown(error.cause)) {
    return new HttpError(503, 'unavailable', 'The database is not answering. Try again in a moment.');
  }
  return new HttpError(500, 'internal', 'Something went wrong on our side. The error has been logged.');
}

function isDatabaseDown(error: unknown): boolean {
  const code = (error as { code?: string } | undefined)?.code;
  return ['ECONNREFUSED', 'ER_GET_CONNECTION_TIMEOUT', 'ER_SOCKET_UNEXPECTED_CLOSE', 'ECONNRESET', 'ER_CONNECTION_TIMEOUT'].includes(
    code ?? '',
  );
}
