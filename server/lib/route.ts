import type { Request, RequestHandler, Response } from 'express';
import type { z, ZodType } from 'zod';
import type { User } from '../models';
import { InvalidInputError, NotSignedInError, type Issue } from './errors';

/** The zod schemas of a route's inputs, from `shared/schemas/`. Leave out what the route does not read. */
export type RouteSchemas = { params?: ZodType; body?: ZodType; query?: ZodType };

/** A part's parsed value when its schema is given; `undefined` otherwise, so reading it is a compile error. */
type Parsed<S, K extends keyof RouteSchemas> = S extends { [P in K]: infer T extends ZodType } ? z.output<T> : undefined;

/** What a handler receives: typed inputs, the caller, and Express's request and response for sending. */
export type RouteContext<S extends RouteSchemas, U> = {
  params: Parsed<S, 'params'>;
  body: Parsed<S, 'body'>;
  query: Parsed<S, 'query'>;
  /** The signed-in person (`route`), or null for visitors (`openRoute`). */
  user: U;
  req: Request;
  res: Response;
};

type Handler<S extends RouteSchemas, U> = (ctx: RouteContext<S, U>) => Promise<void> | void;

/** Flattens zod issues into `{ path, message }` pairs the client can put beside fields. */
export function zodIssues(error: z.ZodError): Issue[] {
  return error.issues.map((i) => ({ path: i.path.join('.'), message: i.message }));
}

/**
 * Parses params, query and body with their schemas; every problem at once, as one 400. Express's
 * request keeps its raw values: handlers read the parsed ones from their context.
 */
export function parseInput<S extends RouteSchemas>(schemas: S, req: Request): Pick<RouteContext<S, unknown>, 'params' | 'body' | 'query'> {
  const issues: Issue[] = [];
  const out: Record<string, unknown> = {};
  for (const part of ['params', 'query', 'body'] as const) {
    const schema = schemas[part];
    if (!schema) continue;
    const r = schema.safeParse(req[part] ?? {});
    if (r.success) out[part] = r.data;
    else issues.push(...zodIssues(r.error));
  }
  if (issues.length) throw new InvalidInputError(issues);
  return out as Pick<RouteContext<S, unknown>, 'params' | 'body' | 'query'>;
}

/**
 * A route for signed-in people: 401 first, then 400 for input that fails its schemas, then the
 * handler with `params`, `body` and `query` typed from the schemas' output.
 *
 * ```ts
 * r.get('/tutorials/:id/supplies', route({ params: idParams }, async ({ params, user, res }) => {
 *   const { tutorial, abilities } = await loadTutorial(user, params.id); // load (404)
 *   authorize(abilities, 'read');                                        // authorize (403)
 *   res.json(presentSupplies(await loadSupplies(tutorial), abilities));  // service, presenter
 * }));
 * ```
 */
export function route<S extends RouteSchemas>(schemas: S, handler: Handler<S, User>): RequestHandler {
  return async (req, res) => {
    if (!req.user) throw new NotSignedInError();
    const input = parseInput(schemas, req);
    await handler({ ...input, user: req.user, req, res });
  };
}

/** A route anyone may call (published exports, media, sign-in): `user` is null for visitors. */
export function openRoute<S extends RouteSchemas>(schemas: S, handler: Handler<S, User | null>): RequestHandler {
  return async (req, res) => {
    const input = parseInput(schemas, req);
    await handler({ ...input, user: req.user ?? null, req, res });
  };
}
