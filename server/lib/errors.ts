/**
 * Domain errors: what went wrong, in words safe to show the caller. Services and loaders throw
 * them without knowing about HTTP; the one error handler (`server/middlewares/error-handler.ts`)
 * maps each class to a status and builds the body with `errorBody`.
 */

/** One field's problem, as the client puts it beside the field. */
export type Issue = { path: string; message: string };

/** The body of every error answer: `{ error, issues?, ...details }`. */
export type ErrorBody = { error: string; issues?: Issue[] } & Record<string, unknown>;

type Details = { issues?: Issue[] } & Record<string, unknown>;

/** Base class: a message for people, optional field issues and extra details (e.g. `line`, `code`). */
export class DomainError extends Error {
  readonly issues?: Issue[];
  readonly details: Record<string, unknown>;
  constructor(message: string, details: Details = {}) {
    super(message);
    const { issues, ...rest } = details;
    this.name = new.target.name;
    this.issues = issues;
    this.details = rest;
  }
}

/** 401: nobody is signed in, or the credentials do not match. */
export class NotSignedInError extends DomainError {
  constructor(message = 'Sign in to continue', details?: Details) {
    super(message, details);
  }
}

/** 403: signed in, but the role does not allow it. */
export class ForbiddenError extends DomainError {
  constructor(message = 'You do not have permission to do that', details?: Details) {
    super(message, details);
  }
}

/** 404: no such record, or one the caller may not know exists (other studios' ids do not leak). */
export class NotFoundError extends DomainError {
  constructor(what = 'That', details?: Details) {
    super(`${what} was not found`, details);
  }
  /** A 404 with a sentence of its own rather than "X was not found". */
  static saying(message: string): NotFoundError {
    const e = new NotFoundError();
    e.message = message;
    return e;
  }
}

/** 400: the input is wrong; `issues` says which field and why. */
export class InvalidInputError extends DomainError {
  constructor(issues: Issue[], message = summarize(issues), details: Record<string, unknown> = {}) {
    super(message, { ...details, issues });
  }
}

/** 400 about the request as a whole (a malformed upload), with no field to point at. */
export class BadRequestError extends DomainError {}

/** 409: the request is fine but the record's state does not allow it now (stale version, last owner, empty cut list). */
export class ConflictError extends DomainError {}

/** 410: a link that worked once and does not any more (used or expired invitation). */
export class GoneError extends DomainError {}

/** 413: an upload or body over its limit. */
export class TooLargeError extends DomainError {}

/** 415: a file of a kind we cannot use. */
export class UnsupportedTypeError extends DomainError {}

/** 422: a well-formed request whose content cannot be read (a transcript with a bad line, a frame ffmpeg cannot grab). */
export class UnprocessableError extends DomainError {}

/** 503: the server cannot take the work right now (busy, stopping, over its time budget, a hosted service such as the payment provider not answering); try again later. */
export class UnavailableError extends DomainError {}

/** "path: message" from the first issue, the sentence a client shows when it has no field to put it beside. */
export function summarize(issues: Issue[]): string {
  const first = issues[0];
  if (!first) return 'Some fields need attention';
  return first.path ? `${first.path}: ${first.message}` : first.message;
}

/**
 * 400 for one field. The error reads "path: sentence"; the issue carries `note`, the short text
 * shown beside the field (the sentence itself unless given).
 */
export function fieldError(path: string, sentence: string, note = sentence): InvalidInputError {
  return new InvalidInputError([{ path, message: note }], `${path}: ${sentence}`);
}

/** The one place that builds an error body; the error handler and nothing else sends it. */
export function errorBody(message: string, opts: { issues?: Issue[]; details?: Record<string, unknown> } = {}): ErrorBody {
  return { error: message, ...(opts.issues ? { issues: opts.issues } : {}), ...opts.details };
}
