import type { Router } from 'express';
import { z } from 'zod';
import { listRoutes, type RouteEntry } from '../../http/route-table';

const errorBody = {
  type: 'object',
  required: ['error'],
  properties: {
    error: {
      type: 'object',
      required: ['code', 'message'],
      properties: {
        code: { type: 'string' },
        message: { type: 'string' },
        fields: { type: 'object', additionalProperties: { type: 'string' } },
      },
    },
  },
} as const;

const toJsonSchema = (schema: z.ZodType) => z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any', target: 'draft-2020-12' });

/** Query and path parameters from an object schema's properties. */
function parameters(entry: RouteEntry) {
  const out: object[] = [];
  const openApiPath = entry.path;
  for (const name of [...openApiPath.matchAll(/:(\w+)/g)].map((m) => m[1])) {
    const params = entry.schemas.params ? (toJsonSchema(entry.schemas.params) as { properties?: Record<string, object> }) : undefined;
    out.push({ name, in: 'path', required: true, schema: params?.properties?.[name] ?? { type: 'string' } });
  }
  if (entry.schemas.query) {
    const query = toJsonSchema(entry.schemas.query) as { properties?: Record<string, object>; required?: string[] };
    for (const [name, schema] of Object.entries(query.properties ?? {})) {
      out.push({ name, in: 'query', required: query.required?.includes(name) ?? false, schema });
    }
  }
  return out;
}

/**
 * The OpenAPI 3.1 description of the API, generated from the mounted router and the
 * zod schemas its routes validate with (one definition, never written twice).
 */
export function buildOpenApi(router: Router, prefix = '/api') {
  const paths: Record<string, Record<string, object>> = {};
  for (const entry of listRoutes(router, prefix)) {
    const path = entry.path.replace(/:(\w+)/g, '{$1}');
    const operation: Record<string, unknown> = {
      operationId: `${entry.method}${entry.path.replace(/[/:{}-]+(\w)?/g, (_m, c: string | undefined) => (c ? c.toUpperCase() : ''))}`,
      parameters: parameters(entry),
      responses: {
        '200': { description: 'Success (201 for creations, 204 when there is no body)' },
        '4XX': { description: 'Bad input or not allowed: the error contract', content: { 'application/json': { schema: errorBody } } },
      },
    };
    if (entry.schemas.body) {
      operation.requestBody = { required: true, content: { 'application/json': { schema: toJsonSchema(entry.schemas.body) } } };
    }
    if (entry.method !== 'get') {
      operation.parameters = [
        ...(operation.parameters as object[]),
        { name: 'X-CSRF-Token', in: 'header', required: true, schema: { type: 'string' }, description: 'From GET /api/auth/me' },
      ];
    }
    (paths[path] ??= {})[entry.method] = operation;
  }
  return {
    openapi: '3.1.0',
    info: {
      title: 'Windway API',
      version: '1.0.0',
      description: 'A reviewed archive of primary sources on historical woodwinds. Errors: { error: { code, message, fields? } }.',
    },
    servers: [{ url: '/' }],
    paths,
  };
}
