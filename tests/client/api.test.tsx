import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest';
import { api, ApiError, clearCsrfToken, networkErrorMessage } from '@/lib/api';
import { json, stubFetch } from './support';

beforeEach(() => clearCsrfToken());
afterEach(() => vi.unstubAllGlobals());

describe('api helper errors', () => {
  it('maps the error contract to an ApiError with status, code, message and fields', async () => {
    stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : json(
            {
              error: {
                code: 'validation_failed',
                message: 'Some fields need attention.',
                fields: { email: 'This address is already registered' },
              },
            },
            400,
          ),
    );

    const error = await api.post('/api/auth/register', { email: 'a@b.org' }).catch((e: unknown) => e);

    expect(error).toBeInstanceOf(ApiError);
    expect(error).toMatchObject({
      status: 400,
      code: 'validation_failed',
      message: 'Some fields need attention.',
      fields: { email: 'This address is already registered' },
    });
  });

  it('derives a code from the status when the body is not the contract', async () => {
    stubFetch(() => new Response('<html>Bad gateway</html>', { status: 502, headers: { 'Content-Type': 'text/html' } }));
    await expect(api.get('/api/sources')).rejects.toMatchObject({ status: 502, code: 'unavailable' });
  });

  it('turns a network failure into an ApiError with a clear message', async () => {
    stubFetch(() => {
      throw new TypeError('Failed to fetch');
    });
    await expect(api.get('/api/sources')).rejects.toMatchObject({ status: 0, message: networkErrorMessage });
  });

  it('sends query parameters without empty values and same-origin credentials', async () => {
    const fetchMock = vi.fn(async () => json({ data: [] }));
    vi.stubGlobal('fetch', fetchMock);
    await api.get('/api/users', { params: { page: 2, q: '', role: undefined, sort: '-createdAt' } });
    expect(fetchMock).toHaveBeenCalledWith(
      '/api/users?page=2&sort=-createdAt',
      expect.objectContaining({ method: 'GET', credentials: 'same-origin' }),
    );
  });
});

describe('api helper CSRF', () => {
  it('fetches a token from /api/auth/me and sends it as X-CSRF-Token', async () => {
    const calls = stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : new Response(null, { status: 204 }),
    );

    await api.post('/api/auth/logout');

    expect(calls.map((c) => `${c.method} ${c.url}`)).toEqual(['GET /api/auth/me', 'POST /api/auth/logout']);
    expect(calls[1].headers.get('X-CSRF-Token')).toBe('t1');
    expect(calls[0].headers.get('X-CSRF-Token')).toBeNull();
  });

  it('takes a new token from an auth response that carries csrfToken', async () => {
    const calls = stubFetch((call) => {
      if (call.url === '/api/auth/me') return json({ user: null, csrfToken: 't1', demo: false, mailCapture: false });
      if (call.url === '/api/auth/login') return json({ user: { id: 1 }, csrfToken: 't2' });
      return json({ data: {} });
    });

    await api.post('/api/auth/login', { email: 'a@b.org', password: 'x' });
    await api.patch('/api/users/1', { role: 'editor' });

    expect(calls.at(-1)?.headers.get('X-CSRF-Token')).toBe('t2');
    expect(calls.filter((c) => c.url === '/api/auth/me')).toHaveLength(1);
  });

  it('refetches the token once and retries after a 403 csrf_invalid', async () => {
    let meCount = 0;
    let patchCount = 0;
    const calls = stubFetch((call) => {
      if (call.url === '/api/auth/me') {
        meCount += 1;
        return json({ user: null, csrfToken: `t${meCount}`, demo: false, mailCapture: false });
      }
      patchCount += 1;
      return patchCount === 1
        ? json({ error: { code: 'csrf_invalid', message: 'Session token expired' } }, 403)
        : json({ data: { id: 3, role: 'editor' } });
    });

    const result = await api.patch<{ data: { id: number } }>('/api/users/3', { role: 'editor' });

    expect(result.data.id).toBe(3);
    expect(calls.map((c) => `${c.method} ${c.url}`)).toEqual([
      'GET /api/auth/me',
      'PATCH /api/users/3',
      'GET /api/auth/me',
      'PATCH /api/users/3',
    ]);
    expect(calls[1].headers.get('X-CSRF-Token')).toBe('t1');
    expect(calls[3].headers.get('X-CSRF-Token')).toBe('t2');
  });

  it('gives up after one retry when the token is refused again', async () => {
    const calls = stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 'stale', demo: false, mailCapture: false })
        : json({ error: { code: 'csrf_invalid', message: 'Session token expired' } }, 403),
    );

    await expect(api.delete('/api/programmes/1')).rejects.toMatchObject({ status: 403, code: 'csrf_invalid' });
    expect(calls.filter((c) => c.method === 'DELETE')).toHaveLength(2);
  });

  it('does not retry a 403 with another code', async () => {
    const calls = stubFetch((call) =>
      call.url === '/api/auth/me'
        ? json({ user: null, csrfToken: 't1', demo: false, mailCapture: false })
        : json({ error: { code: 'forbidden', message: 'Only editors may review' } }, 403),
    );

    await expect(api.post('/api/reviews', {})).rejects.toMatchObject({ code: 'forbidden', message: 'Only editors may review' });
    expect(calls.filter((c) => c.method === 'POST')).toHaveLength(1);
  });
});
