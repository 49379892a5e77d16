import type { RequestHandler } from 'express';
import { z, type ZodType } from 'zod';
import { invalid } from '../errors';

/** Turns zod issues into `{ field: message }`, naming nested fields with dots. */
export function fieldErrors(error: z.ZodError): Record<string, string> {
  const fields: Record<string, string> = {};
  for (const issue of error.issues) {
    let key = issue.path.map(String).join('.');
    if (issue.code === 'unrecognized_keys') {
      for (const unknown of issue.keys) {
        fields[key ? `${key}.${unknown}` : unknown] = `Unknown field "${unknown}": remove it.`;
      }
      continue;
    }
    key ||= '_';
    fields[key] ??= issue.message;
  }
  return fields;
}

/** Parses a value or throws a 400 that names every field to fix. */
export function parseOrThrow<T extends ZodType>(schema: T, value: unknown, message?: string): z.output<T> {
  const result = schema.safeParse(value);
  if (!result.success) throw invalid(fieldErrors(result.error), message);
  return result.data;
}

/**
 * Validates and replaces `req.body`, `req.query` and `req.params` with the parsed
 * (coerced, defaulted) values, so handlers only ever see valid input.
 */
export interface ValidationSchemas {
  body?: ZodType;
  query?: ZodType;
  params?: ZodType;
}

/** The schemas a `validate()` middleware checks, kept on it so the OpenAPI description reads them. */
export const schemasOf = (handler: unknown): ValidationSchemas | undefined =>
  (handler as { validationSchemas?: ValidationSchemas } | undefined)?.validationSchemas;

export function validate(schemas: ValidationSchemas): RequestHandler {
  const middleware: RequestHandler = (req, _res, next) => {
    if (schemas.params) req.params = parseOrThrow(schemas.params, req.params) as typeof req.params;
    if (schemas.query) {
      const query = parseOrThrow(schemas.query, req.query);
      Object.defineProperty(req, 'query', { value: query, writable: true, configurable: true });
    }
    if (schemas.body) req.body = parseOrThrow(schemas.body, req.body ?? {});
    next();
  };
  return Object.assign(middleware, { validationSchemas: schemas });
}
