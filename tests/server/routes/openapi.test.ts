import { describe, it, expect } from 'vitest';
import { anonymous } from '../../support/http';
import { listRoutes } from '@server/http/route-table';
import { apiRouter } from '@server/routes';

describe('GET /api/openapi.json', () => {
  it('is an OpenAPI 3.1 document (OpenAPI Specification 3.1.0, "OpenAPI Object")', async () => {
    const res = await (await anonymous()).get('/api/openapi.json').expect(200);
    expect(res.body.openapi).toBe('3.1.0');
    expect(res.body.info).toMatchObject({ title: expect.any(String), version: expect.any(String) });
    for (const [path, item] of Object.entries(res.body.paths as Record<string, Record<string, { responses: object }>>)) {
      expect(path.startsWith('/')).toBe(true);
      for (const operation of Object.values(item)) expect(operation.responses).toBeTruthy();
    }
  });

  it('describes exactly the routes the Express router serves, with their validated inputs', async () => {
    const res = await (await anonymous()).get('/api/openapi.json').expect(200);
    const described = Object.entries(res.body.paths as Record<string, Record<string, unknown>>).flatMap(([path, item]) =>
      Object.keys(item).map((method) => `${method.toUpperCase()} ${path}`),
    );
    const mounted = listRoutes(apiRouter(), '/api').map((r) => `${r.method.toUpperCase()} ${r.path.replace(/:(\w+)/g, '{$1}')}`);
    expect(new Set(described)).toEqual(new Set(mounted));

    const register = res.body.paths['/api/auth/register'].post;
    expect(register.requestBody.content['application/json'].schema.required).toEqual(expect.arrayContaining(['email', 'password']));
    const sounding = res.body.paths['/api/reckon/sounding'].get;
    expect(sounding.parameters.map((p: { name: string }) => p.name)).toEqual(expect.arrayContaining(['size', 'a']));
  });
});
