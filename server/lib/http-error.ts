/** An error with an HTTP status and a message safe to show the caller. */
export class HttpError extends Error {
  constructor(
    public status: number,
    message: string,
    public extra: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

export const notFound = (what = 'That') => new HttpError(404, `${what} was not found`);
export const forbidden = (message = 'You do not have permission to do that') => new HttpError(403, message);
export const unauthorized = () => new HttpError(401, 'Sign in to continue');
