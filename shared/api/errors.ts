/**
 * The JSON error contract shared by server and client:
 * `{ "error": { "code", "message", "fields"?: { [field]: message } } }`.
 */
export const apiErrorCodes = [
  'bad_request',
  'validation_failed',
  'unauthenticated',
  'forbidden',
  'csrf_invalid',
  'not_found',
  'conflict',
  'payload_too_large',
  'unsupported_media_type',
  'rate_limited',
  'unavailable',
  'internal',
] as const;

export type ApiErrorCode = (typeof apiErrorCodes)[number];

/** Field path (e.g. `email`, `excerpts.0.locator`) → human-readable message. */
export type ApiFieldErrors = Record<string, string>;

export interface ApiErrorBody {
  error: {
    code: ApiErrorCode;
    message: string;
    fields?: ApiFieldErrors;
  };
}

/** The status each code is answered with. */
export const apiErrorStatus: Record<ApiErrorCode, number> = {
  bad_request: 400,
  validation_failed: 400,
  unauthenticated: 401,
  forbidden: 403,
  csrf_invalid: 403,
  not_found: 404,
  conflict: 409,
  payload_too_large: 413,
  unsupported_media_type: 415,
  rate_limited: 429,
  unavailable: 503,
  internal: 500,
};

export function isApiErrorCode(value: unknown): value is ApiErrorCode {
  return typeof value === 'string' && (apiErrorCodes as readonly string[]).includes(value);
}

/** Best-fitting code for a status when a response carries no error body (e.g. a proxy's 502 page). */
export function codeForStatus(status: number): ApiErrorCode {
  const byStatus: Record<number, ApiErrorCode> = {
    400: 'bad_request',
    401: 'unauthenticated',
    403: 'forbidden',
    404: 'not_found',
    409: 'conflict',
    410: 'not_found',
    413: 'payload_too_large',
    415: 'unsupported_media_type',
    422: 'validation_failed',
    429: 'rate_limited',
    502: 'unavailable',
    503: 'unavailable',
    504: 'unavailable',
  };
  return byStatus[status] ?? (status >= 400 && status < 500 ? 'bad_request' : 'internal');
}

/** Narrow an unknown JSON value to the error contract. */
export function isApiErrorBody(value: unknown): value is ApiErrorBody {
  if (typeof value !== 'object' || value === null || !('error' in value)) return false;
  const error = (value as { error: unknown }).error;
  if (typeof error !== 'object' || error === null) return false;
  const { code, message, fields } = error as Record<string, unknown>;
  if (typeof code !== 'string' || typeof message !== 'string') return false;
  if (fields === undefined) return true;
  return (
    typeof fields === 'object' &&
    fields !== null &&
    Object.values(fields).every((v) => typeof v === 'string')
  );
}
