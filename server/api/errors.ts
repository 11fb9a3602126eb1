import { ZodError } from 'zod';

/** An error that maps to one HTTP status and a message safe to show. */
export class HttpError extends Error {
  constructor(
    readonly status: 400 | 401 | 403 | 404 | 409 | 410 | 413 | 415 | 422 | 429 | 502,
    message: string,
    readonly fields?: Record<string, string[]>,
    /** Extra response headers (Retry-After on a 429). */
    readonly headers?: Record<string, string>,
  ) {
    super(message);
  }
}

export const unauthorized = () => new HttpError(401, 'Sign in to continue.');
export const forbidden = () => new HttpError(403, 'Your role does not allow this.');
/** Missing and "another shop's" look the same from outside. */
export const notFound = (what = 'That') => new HttpError(404, `${what} was not found.`);
export const conflict = (message: string) => new HttpError(409, message);

export interface ErrorBody {
  error: string;
  fields?: Record<string, string[]>;
}

/** The one error mapper: zod → 422 with field messages, HttpError → its status, anything else → 500. */
export function toErrorResponse(error: unknown, requestId?: string): { status: number; body: ErrorBody; headers?: Record<string, string> } {
  if (error instanceof HttpError) {
    return { status: error.status, body: { error: error.message, ...(error.fields ? { fields: error.fields } : {}) }, headers: error.headers };
  }
  if (error instanceof ZodError) {
    return { status: 422, body: { error: 'Some values are not valid.', fields: zodFieldErrors(error) } };
  }
  // With its stack, and the request id the answer carries so the two can be matched.
  reportError(error, requestId);
  return { status: 500, body: { error: 'Something went wrong on our side. Nothing was saved.' } };
}

let reportError: (error: unknown, requestId?: string) => void = (error) => console.error(error);

/** Where unexpected errors go (the route wrapper sends them to the structured log). */
export function setErrorReporter(report: (error: unknown, requestId?: string) => void): void {
  reportError = report;
}

export function zodFieldErrors(error: ZodError): Record<string, string[]> {
  const fields: Record<string, string[]> = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}
