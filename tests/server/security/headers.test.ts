/**
 * Security headers through helmet and the JSON error contract. The 500/503 path of a
 * database outage is tested with a real outage in tests/server/faults/database-restart.test.ts.
 */
import { describe, expect, it } from 'vitest';
import { anonymous } from '../../support/http';

function directives(csp: string): Map<string, string[]> {
  return new Map(
    csp
      .split(';')
      .map((d) => d.trim().split(/\s+/))
      .filter((parts) => parts[0])
      .map(([name, ...values]) => [name.toLowerCase(), values]),
  );
}

describe('security headers', () => {
  for (const path of ['/api/health', '/api/auth/me', '/api/no-such-route', '/oai?verb=Identify']) {
    it(`are set on ${path}`, async () => {
      const res = await (await anonymous()).get(path);
      const csp = directives(String(res.headers['content-security-policy']));
      // ASVS 4.0.3 V14.4.3 — a Content Security Policy that limits script and content sources.
      expect(csp.get('default-src')).toEqual(["'self'"]);
      expect(csp.get('script-src')).toEqual(["'self'"]);
      expect(csp.get('object-src')).toEqual(["'none'"]);
      // The PDF viewer's worker (pdf.js) loads from our origin or a blob: URL.
      expect(csp.get('worker-src')).toEqual(expect.arrayContaining(["'self'", 'blob:']));
      expect(csp.get('base-uri')).toEqual(["'self'"]);
      // ASVS V14.4.7 — not framed by other sites (clickjacking).
      expect(csp.get('frame-ancestors')).toEqual(["'none'"]);
      expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
      // Nothing unsafe for scripts.
      expect(String(res.headers['content-security-policy'])).not.toMatch(/script-src[^;]*'unsafe-(inline|eval)'/);
      // ASVS V14.4.4 — nosniff.
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      // ASVS V14.4.6 — a Referrer-Policy.
      expect(res.headers['referrer-policy']).toMatch(/no-referrer|same-origin|strict-origin/);
      // ASVS V14.3.3 — the server does not advertise its framework.
      expect(res.headers['x-powered-by']).toBeUndefined();
      expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
      // ASVS V14.4.5 — HSTS (browsers apply it once the site is served over TLS).
      expect(res.headers['strict-transport-security']).toMatch(/max-age=\d{7,}/);
    });
  }

  it('answers API responses with a JSON content type and charset', async () => {
    // ASVS V14.4.1 — every response has a Content-Type with a safe charset.
    const res = await (await anonymous()).get('/api/auth/me');
    expect(res.headers['content-type']).toMatch(/^application\/json; charset=utf-8/i);
  });

  it('keeps the session responses out of shared caches', async () => {
    // ASVS V8.2.1 — anti-caching headers on responses that carry session data (the CSRF token).
    const res = await (await anonymous()).get('/api/auth/me');
    expect(res.headers['cache-control']).toMatch(/no-store/);
  });
});

describe('error contract', () => {
  it.each(['GET', 'POST', 'PATCH', 'DELETE'])('an unknown API route is a 404 in JSON for %s', async (method) => {
    // ASVS V7.4.1 — a generic error message, no internals.
    const client = await anonymous();
    const path = '/api/definitely/not/here';
    const res = method === 'GET' ? await client.get(path) : method === 'POST' ? await client.post(path, {}) : method === 'PATCH' ? await client.patch(path, {}) : await client.delete(path);
    // Writes without a valid session token are refused first (403); with one, 404.
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
  });

  it('a write without the CSRF token is 403 in JSON, before any route runs', async () => {
    // ASVS V4.2.2 — anti-CSRF; V13.2.3 — token on state-changing API calls.
    const client = await anonymous();
    const res = await client.agent.post('/api/definitely/not/here').send({});
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('csrf_invalid');
  });

  it('bad JSON and path traversal attempts never show a stack trace or a file path', async () => {
    // ASVS V7.4.1 / V14.3.2 — no debug output, stack traces or paths in responses.
    const client = await anonymous();
    const responses = [
      await client.agent.post('/api/auth/login').set('X-CSRF-Token', client.csrfToken).set('Content-Type', 'application/json').send('{"email": "a@b", '),
      await client.get('/api/sources/..%2f..%2fetc%2fpasswd'),
      await client.get('/api/facsimiles/1%00/file'),
      await client.get('/api/excerpts/E0000000/cite?format=bibtex&style=../../../../etc/passwd'),
    ];
    for (const res of responses) {
      expect(res.status).toBeGreaterThanOrEqual(400);
      expect(res.status).toBeLessThan(500);
      expect(res.body.error?.code).toBeTruthy();
      const text = JSON.stringify(res.body);
      expect(text).not.toMatch(/\bat\s+\S+\s*\(|\.ts:\d+|node_modules|\/work\/|SequelizeError|stack/i);
    }
  });
});
