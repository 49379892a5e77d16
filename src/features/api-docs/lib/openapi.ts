/** The parts of an OpenAPI 3.1 document the API page reads, and how it groups and words them. */

export type JsonSchema = {
  type?: string | string[];
  enum?: unknown[];
  const?: unknown;
  default?: unknown;
  description?: string;
  items?: JsonSchema;
  anyOf?: JsonSchema[];
  oneOf?: JsonSchema[];
  allOf?: JsonSchema[];
  format?: string;
  minimum?: number;
  maximum?: number;
  maxLength?: number;
  pattern?: string;
  [key: string]: unknown;
};

export interface Parameter {
  name: string;
  in: 'query' | 'path' | 'header' | 'cookie';
  required?: boolean;
  description?: string;
  schema?: JsonSchema;
}

export interface Operation {
  operationId?: string;
  summary?: string;
  description?: string;
  parameters?: Parameter[];
  requestBody?: { required?: boolean; content?: Record<string, { schema?: JsonSchema }> };
  responses?: Record<string, { description?: string; content?: Record<string, { schema?: JsonSchema }> }>;
}

export const httpMethods = ['get', 'post', 'put', 'patch', 'delete'] as const;
export type HttpMethod = (typeof httpMethods)[number];

export interface OpenApiDocument {
  openapi: string;
  info: { title: string; version: string; description?: string };
  paths: Record<string, Partial<Record<HttpMethod, Operation>>>;
}

export interface Endpoint {
  id: string;
  method: HttpMethod;
  path: string;
  group: string;
  operation: Operation;
}

/** `/api/sources/{id}/cite` → `sources`; anything outside /api by its own first segment. */
export function groupOf(path: string): string {
  const parts = path.split('/').filter(Boolean);
  const rest = parts[0] === 'api' ? parts.slice(1) : parts;
  return rest[0] && !rest[0].startsWith('{') ? rest[0] : '(root)';
}

export function endpointsOf(doc: OpenApiDocument): Endpoint[] {
  const out: Endpoint[] = [];
  for (const [path, item] of Object.entries(doc.paths ?? {})) {
    for (const method of httpMethods) {
      const operation = item?.[method];
      if (operation) out.push({ id: `${method}-${path}`.replace(/[^\w-]+/g, '-'), method, path, group: groupOf(path), operation });
    }
  }
  const rank = (m: HttpMethod) => httpMethods.indexOf(m);
  return out.sort((a, b) => a.group.localeCompare(b.group) || a.path.localeCompare(b.path) || rank(a.method) - rank(b.method));
}

export function groupEndpoints(endpoints: readonly Endpoint[]): { group: string; endpoints: Endpoint[] }[] {
  const groups = new Map<string, Endpoint[]>();
  for (const e of endpoints) groups.set(e.group, [...(groups.get(e.group) ?? []), e]);
  return [...groups].map(([group, list]) => ({ group, endpoints: list }));
}

/** Does an endpoint match the words typed in the filter box (all of them, anywhere)? */
export function matches(endpoint: Endpoint, query: string): boolean {
  const words = query.toLowerCase().split(/\s+/).filter(Boolean);
  if (!words.length) return true;
  const o = endpoint.operation;
  const hay = [endpoint.method, endpoint.path, o.operationId, o.summary, o.description, ...(o.parameters ?? []).map((p) => p.name)]
    .filter(Boolean)
    .join(' ')
    .toLowerCase();
  return words.every((w) => hay.includes(w));
}

export interface SchemaSummary {
  type: string;
  values?: string[];
  defaultValue?: string;
  notes: string[];
}

/** A schema in a few words: its type(s), allowed values, default and bounds. */
export function describeSchema(schema: JsonSchema | undefined): SchemaSummary {
  if (!schema) return { type: 'any', notes: [] };
  const types = new Set<string>();
  const values = new Set<string>();
  const notes: string[] = [];
  let defaultValue = schema.default;
  const collect = (s: JsonSchema) => {
    s.enum?.forEach((v) => values.add(String(v)));
    if (s.const !== undefined) values.add(String(s.const));
    s.items?.enum?.forEach((v) => values.add(String(v)));
    for (const t of Array.isArray(s.type) ? s.type : s.type ? [s.type] : []) {
      types.add(t === 'array' && typeof s.items?.type === 'string' ? `array of ${s.items.type}` : t);
    }
    if (s.minimum !== undefined) notes.push(`≥ ${s.minimum}`);
    if (s.maximum !== undefined) notes.push(`≤ ${s.maximum}`);
    if (s.maxLength !== undefined) notes.push(`at most ${s.maxLength} characters`);
    if (s.format) notes.push(s.format);
    if (defaultValue === undefined && s.default !== undefined) defaultValue = s.default;
    [...(s.anyOf ?? []), ...(s.oneOf ?? []), ...(s.allOf ?? [])].forEach(collect);
  };
  collect(schema);
  if (schema.description) notes.push(schema.description);
  return {
    type: types.size ? [...types].join(' | ') : values.size ? 'string' : 'any',
    values: values.size ? [...values] : undefined,
    defaultValue: defaultValue === undefined ? undefined : JSON.stringify(defaultValue),
    notes: [...new Set(notes)],
  };
}
