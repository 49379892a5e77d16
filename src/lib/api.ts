import {
  codeForStatus,
  isApiErrorBody,
  type ApiErrorCode,
  type ApiFieldErrors,
} from '@shared/api/errors';

/** A failed API call: the server's error contract, or a network failure (status 0). */
export class ApiError extends Error {
  override readonly name = 'ApiError';
  readonly status: number;
  readonly code: ApiErrorCode;
  readonly fields?: ApiFieldErrors;
  /** Seconds to wait, from `Retry-After`, when the server sent one. */
  readonly retryAfter?: number;

  constructor(init: {
    status: number;
    code: ApiErrorCode;
    message: string;
    fields?: ApiFieldErrors;
    retryAfter?: number;
  }) {
    super(init.message);
    this.status = init.status;
    this.code = init.code;
    this.fields = init.fields;
    this.retryAfter = init.retryAfter;
  }

  get isNetworkError(): boolean {
    return this.status === 0;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

export const networkErrorMessage =
  'Windway could not be reached. Check your connection and try again.';

const defaultMessages: Record<ApiErrorCode, string> = {
  bad_request: 'The request was not understood.',
  validation_failed: 'Some fields need attention.',
  unauthenticated: 'Please sign in to continue.',
  forbidden: 'Your account is not allowed to do this.',
  csrf_invalid: 'Your session has expired. Reload the page and try again.',
  not_found: 'This could not be found.',
  conflict: 'This was changed elsewhere in the meantime. Reload and try again.',
  payload_too_large: 'The file or text is too large.',
  unsupported_media_type: 'This kind of file is not accepted.',
  rate_limited: 'Too many attempts. Please wait a little and try again.',
  unavailable: 'Windway is briefly unavailable. Please try again shortly.',
  internal: 'Something went wrong on our side. Please try again.',
};

// ---- CSRF token: kept in module state, refreshed from any body carrying `csrfToken`.

let csrfToken: string | null = null;
let pendingToken: Promise<string> | null = null;

/** Forget the cached token (after sign-out, or in tests); the next write fetches a fresh one. */
export function clearCsrfToken(): void {
  csrfToken = null;
  pendingToken = null;
}

function rememberToken(body: unknown): void {
  if (typeof body === 'object' && body !== null && 'csrfToken' in body) {
    const token = (body as { csrfToken: unknown }).csrfToken;
    if (typeof token === 'string' && token) csrfToken = token;
  }
}

async function ensureCsrfToken(): Promise<string> {
  if (csrfToken) return csrfToken;
  pendingToken ??= request<unknown>('GET', '/api/auth/me', undefined, {}, false)
    .then(() => {
      if (!csrfToken) throw new ApiError({ status: 0, code: 'csrf_invalid', message: defaultMessages.csrf_invalid });
      return csrfToken;
    })
    .finally(() => {
      pendingToken = null;
    });
  return pendingToken;
}

// ---- Requests

export type QueryParams = Record<string, string | number | boolean | null | undefined>;

export interface RequestOptions {
  /** Appended as a query string; `undefined`, `null` and `''` are left out. */
  params?: QueryParams;
  signal?: AbortSignal;
  headers?: HeadersInit;
}

type Method = 'GET' | 'POST' | 'PATCH' | 'PUT' | 'DELETE';

export function buildUrl(path: string, params?: QueryParams): string {
  if (!params) return path;
  const search = new URLSearchParams();
  for (const [key, value] of Object.entries(params)) {
    if (value === undefined || value === null || value === '') continue;
    search.set(key, String(value));
  }
  const query = search.toString();
  if (!query) return path;
  return `${path}${path.includes('?') ? '&' : '?'}${query}`;
}

async function readBody(response: Response): Promise<unknown> {
  if (response.status === 204 || response.status === 205) return undefined;
  const text = await response.text();
  if (!text) return undefined;
  const type = response.headers.get('content-type') ?? '';
  if (type.includes('json')) {
    try {
      return JSON.parse(text);
    } catch {
      return text;
    }
  }
  return text;
}

/** Map a failed response to an ApiError, preferring the server's own code and message. */
export function toApiError(status: number, body: unknown, headers?: Headers): ApiError {
  const retryHeader = headers?.get('retry-after');
  const retryAfter = retryHeader && /^\d+$/.test(retryHeader) ? Number(retryHeader) : undefined;
  if (isApiErrorBody(body)) {
    const { code, message, fields } = body.error;
    return new ApiError({ status, code, message: message || defaultMessages[code], fields, retryAfter });
  }
  const code = codeForStatus(status);
  return new ApiError({ status, code, message: defaultMessages[code], retryAfter });
}

async function request<T>(
  method: Method,
  path: string,
  body: unknown,
  options: RequestOptions,
  mayRetryCsrf = true,
): Promise<T> {
  const stateChanging = method !== 'GET';
  const headers = new Headers(options.headers);
  headers.set('Accept', 'application/json');
  const isForm = typeof FormData !== 'undefined' && body instanceof FormData;
  if (body !== undefined && !isForm) headers.set('Content-Type', 'application/json');
  if (stateChanging) headers.set('X-CSRF-Token', await ensureCsrfToken());

  let response: Response;
  try {
    response = await fetch(buildUrl(path, options.params), {
      method,
      headers,
      credentials: 'same-origin',
      body: body === undefined ? undefined : isForm ? (body as FormData) : JSON.stringify(body),
      signal: options.signal,
    });
  } catch (cause) {
    if (cause instanceof DOMException && cause.name === 'AbortError') throw cause;
    throw new ApiError({ status: 0, code: 'unavailable', message: networkErrorMessage });
  }

  const data = await readBody(response);
  rememberToken(data);
  if (response.ok) return data as T;

  const error = toApiError(response.status, data, response.headers);
  if (error.code === 'csrf_invalid' && stateChanging && mayRetryCsrf) {
    clearCsrfToken();
    return request<T>(method, path, body, options, false);
  }
  throw error;
}


export interface UploadOptions {
  /** Called with bytes sent and total (total is 0 when unknown). */
  onProgress?: (progress: { loaded: number; total: number; fraction: number }) => void;
  signal?: AbortSignal;
  mayRetryCsrf?: boolean;
}

/**
 * POST multipart data with upload progress. `fetch` cannot report upload progress,
 * so this uses XMLHttpRequest with the same CSRF handling and error mapping.
 */
async function upload<T>(path: string, form: FormData, options: UploadOptions = {}): Promise<T> {
  const token = await ensureCsrfToken();
  const { status, data, headers } = await new Promise<{ status: number; data: unknown; headers: Headers }>(
    (resolve, reject) => {
      const xhr = new XMLHttpRequest();
      xhr.open('POST', path);
      xhr.setRequestHeader('Accept', 'application/json');
      xhr.setRequestHeader('X-CSRF-Token', token);
      xhr.upload.onprogress = (event) => {
        const total = event.lengthComputable ? event.total : 0;
        options.onProgress?.({ loaded: event.loaded, total, fraction: total ? event.loaded / total : 0 });
      };
      xhr.onload = () => {
        let parsed: unknown = xhr.responseText || undefined;
        if ((xhr.getResponseHeader('content-type') ?? '').includes('json') && xhr.responseText) {
          try {
            parsed = JSON.parse(xhr.responseText);
          } catch {
            /* keep the text */
          }
        }
        const retry = xhr.getResponseHeader('retry-after');
        resolve({ status: xhr.status, data: parsed, headers: new Headers(retry ? { 'retry-after': retry } : {}) });
      };
      xhr.onerror = () => reject(new ApiError({ status: 0, code: 'unavailable', message: networkErrorMessage }));
      xhr.onabort = () => reject(new DOMException('Upload cancelled', 'AbortError'));
      options.signal?.addEventListener('abort', () => xhr.abort(), { once: true });
      xhr.send(form);
    },
  );
  rememberToken(data);
  if (status >= 200 && status < 300) return data as T;
  const error = toApiError(status, data, headers);
  if (error.code === 'csrf_invalid' && options.mayRetryCsrf !== false) {
    clearCsrfToken();
    return upload<T>(path, form, { ...options, mayRetryCsrf: false });
  }
  throw error;
}

/**
 * The one way the client talks to `/api`: JSON in and out, same-origin cookies,
 * `X-CSRF-Token` on writes, errors thrown as {@link ApiError}.
 */
export const api = {
  get: <T>(path: string, options: RequestOptions = {}) => request<T>('GET', path, undefined, options),
  post: <T = void>(path: string, body?: unknown, options: RequestOptions = {}) =>
    request<T>('POST', path, body, options),
  put: <T = void>(path: string, body?: unknown, options: RequestOptions = {}) =>
    request<T>('PUT', path, body, options),
  patch: <T = void>(path: string, body?: unknown, options: RequestOptions = {}) =>
    request<T>('PATCH', path, body, options),
  delete: <T = void>(path: string, options: RequestOptions = {}) =>
    request<T>('DELETE', path, undefined, options),
  upload,
};

/** A message fit to show a person, whatever was thrown. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error && error.message) return error.message;
  return defaultMessages.internal;
}
