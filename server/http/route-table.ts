import type { Router } from 'express';
import { schemasOf, type ValidationSchemas } from './validate';

export interface RouteEntry {
  method: 'get' | 'post' | 'put' | 'patch' | 'delete';
  /** Express path with `:params`, e.g. `/api/sources/:id`. */
  path: string;
  schemas: ValidationSchemas;
}

interface Layer {
  handle: { stack?: Layer[] } & ((...args: unknown[]) => unknown);
  rawPath?: string;
  route?: { path: string; methods: Record<string, boolean>; stack: Layer[] };
}

/**
 * Every route of an Express router with the schemas its `validate()` checks, read
 * from the router itself — so the OpenAPI description and the authorization-matrix
 * test cannot drift from what is really mounted.
 */
export function listRoutes(router: Router, prefix = ''): RouteEntry[] {
  const entries: RouteEntry[] = [];
  for (const layer of (router as unknown as { stack: Layer[] }).stack) {
    if (layer.route) {
      const schemas: ValidationSchemas = {};
      for (const inner of layer.route.stack) Object.assign(schemas, schemasOf(inner.handle));
      for (const [method, on] of Object.entries(layer.route.methods)) {
        if (on && method !== '_all') entries.push({ method: method as RouteEntry['method'], path: join(prefix, layer.route.path), schemas });
      }
    } else if (layer.handle.stack && typeof layer.rawPath === 'string') {
      entries.push(...listRoutes(layer.handle as unknown as Router, join(prefix, layer.rawPath)));
    }
  }
  return entries;
}

const join = (a: string, b: string) => `${a}/${b}`.replace(/\/+/g, '/').replace(/(.)\/$/, '$1');
