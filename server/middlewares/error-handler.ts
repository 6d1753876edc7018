import type { ErrorRequestHandler, RequestHandler } from 'express';
import { ZodError } from 'zod';
import { HttpError } from '../lib/http-error';
import { zodIssues } from './validate';

/** Unknown /api paths answer JSON, not the client's HTML. */
export const apiNotFound: RequestHandler = (_req, res) => {
  res.status(404).json({ error: 'No such API endpoint' });
};

/** The one error handler: known errors keep their status and message; anything else is a 500 without a stack. */
export const errorHandler: ErrorRequestHandler = (err, req, res, _next) => {
  if (res.headersSent) return;
  if (err instanceof HttpError) {
    res.status(err.status).json({ error: err.message, ...err.extra });
    return;
  }
  if (err instanceof ZodError) {
    res.status(400).json({ error: 'Some fields need attention', issues: zodIssues(err) });
    return;
  }
  // Body-parser errors carry a status (413 too large, 400 malformed JSON).
  const status = typeof err?.status === 'number' ? err.status : typeof err?.statusCode === 'number' ? err.statusCode : 500;
  if (status === 400 && err?.type === 'entity.parse.failed') {
    res.status(400).json({ error: 'The request body is not valid JSON', issues: [] });
    return;
  }
  if (status === 413) {
    res.status(413).json({ error: 'The request is too large' });
    return;
  }
  if (status >= 400 && status < 500) {
    res.status(status).json({ error: err.expose && err.message ? err.message : 'The request could not be handled' });
    return;
  }
  console.error(`[${req.method} ${req.originalUrl}]`, err);
  res.status(500).json({ error: 'Something went wrong on our side; nothing was changed. Please try again.' });
};
