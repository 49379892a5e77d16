/**
 * Meilisearch-shaped errors. Every error the service returns — in an HTTP
 * response or in a failed task's `error` — is `{message, code, type, link}`,
 * so the official client raises `MeilisearchApiError` with the same body it
 * would get from a real Meilisearch.
 */
export type ErrorType = 'invalid_request' | 'internal' | 'auth' | 'system';

export interface ErrorBody {
  message: string;
  code: string;
  type: ErrorType;
  link: string;
}

/** HTTP status and type per code; unknown codes default to 400 invalid_request. */
const CODES: Record<string, [number, ErrorType]> = {
  index_not_found: [404, 'invalid_request'],
  index_already_exists: [409, 'invalid_request'],
  document_not_found: [404, 'invalid_request'],
  task_not_found: [404, 'invalid_request'],
  missing_authorization_header: [401, 'auth'],
  invalid_api_key: [403, 'auth'],
  internal: [500, 'internal'],
  payload_too_large: [413, 'invalid_request'],
  not_found: [404, 'invalid_request'],
  method_not_allowed: [405, 'invalid_request'],
};

export class ApiError extends Error {
  readonly code: string;
  readonly status: number;
  readonly type: ErrorType;
  constructor(code: string, message: string) {
    super(message);
    this.code = code;
    const [status, type] = CODES[code] ?? [400, 'invalid_request'];
    this.status = status;
    this.type = type;
  }
  toJSON(): ErrorBody {
    return { message: this.message, code: this.code, type: this.type, link: `https://docs.meilisearch.com/errors#${this.code}` };
  }
}

/** Wraps anything thrown into an ApiError so it can be serialised uniformly. */
export function toApiError(err: unknown): ApiError {
  if (err instanceof ApiError) return err;
  const msg = err instanceof Error ? err.message : String(err);
  return new ApiError('internal', msg);
}

export const indexNotFound = (uid: string) => new ApiError('index_not_found', `Index \`${uid}\` not found.`);

/** A value rendered the way Meilisearch's deserialisation errors quote it. */
export function describeValue(v: unknown): string {
  if (v === null) return 'null: `null`';
  if (Array.isArray(v)) return `an array: \`${JSON.stringify(v)}\``;
  switch (typeof v) {
    case 'string': return `a string: \`${JSON.stringify(v)}\``;
    case 'number': return `a number: \`${v}\``;
    case 'boolean': return `a boolean: \`${v}\``;
    default: return `an object: \`${JSON.stringify(v)}\``;
  }
}
