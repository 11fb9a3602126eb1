import { ZodError } from 'zod';
import { DomainError, type DomainErrorKind, type FieldMessages } from '@/lib/errors';

export { conflict, forbidden, gone, invalid, notFound, notFoundBecause } from '@/lib/errors';

/** How each kind of refusal of the shop's rules (lib/errors.ts) answers over HTTP. */
export const STATUS_OF_KIND: Record<DomainErrorKind, 403 | 404 | 409 | 410 | 422 | 502> = {
  invalid: 422,
  forbidden: 403,
  'not-found': 404,
  conflict: 409,
  gone: 410,
  unavailable: 502,
};

/** An error of the web edge itself (not signed in, a body too large or not JSON, too many attempts), with its status. */
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

/** The status an error answers with, when it is one of ours (a refusal of the rules or an error of the edge). */
export function statusOf(error: unknown): number | undefined {
  if (error instanceof DomainError) return STATUS_OF_KIND[error.kind];
  if (error instanceof HttpError) return error.status;
  return undefined;
}

/** A refusal the person can read (rules or edge), as opposed to a fault of ours. */
export const isShownError = (error: unknown): error is DomainError | HttpError => statusOf(error) !== undefined;

export interface ErrorBody {
  error: string;
  fields?: FieldMessages;
  /** A refusal's details sit beside the message (a stock shortage's `missing` pieces and `renest` address). */
  [detail: string]: unknown;
}

/**
 * The one error mapper: a refusal of the shop's rules → its kind's status with fields and details, zod → 422 with
 * field messages, HttpError → its status, anything else → 500.
 */
export function toErrorResponse(error: unknown, requestId?: string): { status: number; body: ErrorBody; headers?: Record<string, string> } {
  if (error instanceof DomainError) {
    return {
      status: STATUS_OF_KIND[error.kind],
      body: { ...error.details, error: error.message, ...(error.fields ? { fields: error.fields } : {}) },
    };
  }
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

export function zodFieldErrors(error: ZodError): FieldMessages {
  const fields: FieldMessages = {};
  for (const issue of error.issues) {
    const key = issue.path.length ? issue.path.join('.') : '_';
    (fields[key] ??= []).push(issue.message);
  }
  return fields;
}
