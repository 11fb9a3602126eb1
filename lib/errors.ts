/**
 * The one vocabulary in which the shop's rules say no. Pure: the database code and `lib/` throw these, and
 * `server/api/errors.ts` maps each kind to an HTTP status in one place (invalid 422, forbidden 403, not found 404,
 * conflict 409, gone 410, unavailable 502). Messages are safe to show to the person who asked.
 */
export type DomainErrorKind = 'invalid' | 'forbidden' | 'not-found' | 'conflict' | 'gone' | 'unavailable';

/** Field path (`lines.2.qty`, or `_` for the whole input) → what is wrong with it. */
export type FieldMessages = Record<string, string[]>;

export class DomainError extends Error {
  constructor(
    readonly kind: DomainErrorKind,
    message: string,
    /** Which fields are wrong (for `invalid`). */
    readonly fields?: FieldMessages,
    /** What the caller needs to act on the refusal, sent beside the message (e.g. the pieces that are gone). */
    readonly details?: Record<string, unknown>,
  ) {
    super(message);
  }
}

/** The input cannot be used as it is: say which field and why. */
export const invalid = (message: string, fields?: FieldMessages) => new DomainError('invalid', message, fields);

/** The person's role or the record's owner does not allow this. */
export const forbidden = (message = 'Your role does not allow this.') => new DomainError('forbidden', message);

/** Missing and "another shop's" look the same from outside: `notFound('The plan')` → "The plan was not found." */
export const notFound = (what = 'That') => new DomainError('not-found', `${what} was not found.`);

/** Not found, said in a sentence of its own (a link that does not work, say). */
export const notFoundBecause = (message: string) => new DomainError('not-found', message);

/** The record is not in a state that allows the step (already sent, no longer free, a name taken). */
export const conflict = (message: string, details?: Record<string, unknown>) => new DomainError('conflict', message, undefined, details);

/** It existed, but is over for good (an expired quote, a used link). */
export const gone = (message: string) => new DomainError('gone', message);

/** A service the step depends on did not answer as it should. */
export const unavailable = (message: string) => new DomainError('unavailable', message);
