import type { ErrorRequestHandler, RequestHandler } from 'express';
import { UniqueConstraintError } from 'sequelize';
import { ZodError } from 'zod';
import {
  BadRequestError,
  ConflictError,
  DomainError,
  errorBody,
  ForbiddenError,
  GoneError,
  InvalidInputError,
  NotFoundError,
  NotSignedInError,
  TooLargeError,
  UnavailableError,
  UnprocessableError,
  UnsupportedTypeError,
} from '../lib/errors';
import { zodIssues } from '../lib/route';

/** Unknown /api paths answer JSON, not the client's HTML. */
export const apiNotFound: RequestHandler = (_req, res) => {
  res.status(404).json(errorBody('No such API endpoint'));
};

/** Each domain error's HTTP status; the only place where services' errors meet HTTP. */
const STATUS: [new (...args: never[]) => DomainError, number][] = [
  [InvalidInputError, 400],
  [BadRequestError, 400],
  [NotSignedInError, 401],
  [ForbiddenError, 403],
  [NotFoundError, 404],
  [ConflictError, 409],
  [GoneError, 410],
  [TooLargeError, 413],
  [UnsupportedTypeError, 415],
  [UnprocessableError, 422],
  [UnavailableError, 503],
];

/** The status of a domain error (a subclass maps like its parent); 500 for one nobody mapped. */
export function statusOf(err: DomainError): number {
  return STATUS.find(([cls]) => err instanceof cls)?.[1] ?? 500;
}

/** The one error handler: known errors keep their status and message; anything else is a 500 without a stack. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (res.headersSent) return;
  if (err instanceof DomainError) {
    const status = statusOf(err);
    if (status !== 500) {
      res.status(status).json(errorBody(err.message, { issues: err.issues, details: err.details }));
      return;
    }
  }
  // A same-moment save that a service did not foresee: a conflict in words, never a 500.
  if (err instanceof UniqueConstraintError) {
    res.status(409).json(errorBody('Someone saved the same thing at the same moment; reload and try again', { details: { code: 'duplicate' } }));
    return;
  }
  if (err instanceof ZodError) {
    res.status(400).json(errorBody('Some fields need attention', { issues: zodIssues(err) }));
    return;
  }
  // Body-parser errors carry a status (413 too large, 400 malformed JSON).
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status === 400 && err?.type === 'entity.parse.failed') {
    res.status(400).json(errorBody('The request body is not valid JSON', { issues: [] }));
    return;
  }
  if (status === 413) {
    res.status(413).json(errorBody('The request is too large'));
    return;
  }
  if (status >= 400 && status < 500) {
    res.status(status).json(errorBody(err.expose && err.message ? err.message : 'The request could not be handled'));
    return;
  }
  console.error(`[${req.method} ${req.originalUrl}]`, err);
  res.status(500).json(errorBody('Something went wrong on our side; nothing was changed. Please try again.'));
};
