import type { RequestHandler } from 'express';
import type { ZodError, ZodType } from 'zod';
import { HttpError } from '../lib/http-error';

/** Flattens zod issues into `{ path, message }` pairs the client can put beside fields. */
export function zodIssues(error: ZodError) {
  return error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

type Schemas = { body?: ZodType; query?: ZodType; params?: ZodType };

/**
 * Parses body, query and params with the shared zod schemas and replaces them with the parsed
 * values; a failure answers 400 with every issue at once.
 */
export function validate(schemas: Schemas): RequestHandler {
  return (req, _res, next) => {
    const issues: { path: string; message: string }[] = [];
    for (const part of ['params', 'query', 'body'] as const) {
      const schema = schemas[part];
      if (!schema) continue;
      const r = schema.safeParse(req[part] ?? {});
      if (r.success) {
        // Express 5 makes req.query a getter; define the parsed value over it.
        Object.defineProperty(req, part, { value: r.data, writable: true, configurable: true, enumerable: true });
      } else {
        issues.push(...zodIssues(r.error));
      }
    }
    if (issues.length) {
      const first = issues[0];
      const message = first.path ? `${first.path}: ${first.message}` : first.message;
      return next(new HttpError(400, message, { issues }));
    }
    next();
  };
}
