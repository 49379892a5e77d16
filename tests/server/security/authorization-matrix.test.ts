/**
 * Every API route × every kind of actor → the expected status (ASVS 4.0.3 V4.1.1 —
 * access rules enforced on the server; V4.1.3 — least privilege; V4.1.5 — access
 * controls fail securely; V4.2.1 — protection against IDOR on others' records;
 * V4.2.2 — anti-CSRF on every write, as every write below carries a valid token).
 * The routes are read from the Express router itself, so a new route without a row in
 * route-expectations.ts fails here.
 */
import { beforeAll, describe, expect, it } from 'vitest';
import { listRoutes } from '@server/http/route-table';
import { apiRouter } from '@server/routes';
import { oaiRouter } from '@server/routes/open-standards/oai';
import { OK, routeExpectations, type Expected, type Row } from './route-expectations';
import { WHO, World, type Who } from './world';

const mounted = [...listRoutes(apiRouter(), '/api'), ...listRoutes(oaiRouter(), '/oai')].map((r) => `${r.method.toUpperCase()} ${r.path}`);
const routeOf = (key: string) => key.split(' · ')[0];
/** Allowed: 200, 201, 204 (and 202, the password-reset request's "on its way"). */
const ALLOWED = new Set([200, 201, 202, 204]);

let world: World;
beforeAll(async () => {
  world = await World.create();
  for (const who of WHO) if (who !== 'anonymous') await world.client(who);
});

async function send(row: Row, method: string, who: Who): Promise<{ status: number; body: unknown }> {
  const req = await row.build(world, who);
  const client = await world.client(who, row.freshSession);
  let test;
  if (req.upload) {
    const { field, name, bytes, fields } = req.upload;
    test = client.agent.post(req.path).set('X-CSRF-Token', client.csrfToken).attach(field, bytes, name);
    for (const [k, v] of Object.entries(fields)) test = test.field(k, v);
  } else if (method === 'GET') test = client.get(req.path);
  else if (method === 'POST') test = client.post(req.path, req.body);
  else if (method === 'PATCH') test = client.patch(req.path, req.body);
  else if (method === 'PUT') test = client.put(req.path, req.body);
  else if (method === 'DELETE') test = client.delete(req.path);
  else throw new Error(`No request builder for method ${method}`);
  const res = await test;
  return { status: res.status, body: res.body };
}

const shown = (status: number, expected: Expected): Expected => (expected === OK && ALLOWED.has(status) ? OK : status);

describe('authorization matrix', () => {
  it('has an entry for every mounted route, and no entry for a route that is gone', () => {
    const missing = mounted.filter((route) => !Object.keys(routeExpectations).some((key) => routeOf(key) === route));
    const stale = Object.keys(routeExpectations).filter((key) => !mounted.includes(routeOf(key)));
    expect(missing.map((r) => `${r}: add an entry to tests/server/security/route-expectations.ts`)).toEqual([]);
    expect(stale.map((k) => `${k}: this route is no longer mounted; remove it from route-expectations.ts`)).toEqual([]);
    expect(mounted.length).toBeGreaterThan(60);
  });

  for (const [key, row] of Object.entries(routeExpectations)) {
    it(key, async () => {
      const method = key.split(' ')[0];
      const actual: Record<string, Expected> = {};
      const expected: Record<string, Expected> = {};
      const details: string[] = [];
      // The six actors run at once: each has its own fresh record.
      const results = await Promise.all(WHO.map((who) => send(row, method, who)));
      for (const [i, who] of WHO.entries()) {
        const { status, body } = results[i];
        actual[who] = shown(status, row.expect[i]);
        expected[who] = row.expect[i];
        if (actual[who] !== expected[who]) details.push(`${who}: ${status} ${JSON.stringify(body).slice(0, 300)}`);
        // ASVS V7.4.1 / V4.1.5: a denial is the JSON error contract, never an empty or HTML page.
        if (status >= 400) expect((body as { error?: { code?: string } }).error?.code, `${key} as ${who}`).toBeTruthy();
      }
      expect(actual, details.join('\n')).toEqual(expected);
    });
  }
});
