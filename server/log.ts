import 'server-only';
import pino, { type DestinationStream, type Logger } from 'pino';
import pretty from 'pino-pretty';

/**
 * Structured logs: one JSON line per event on standard output (pretty in development). Request lines carry method,
 * route, status, ms, shop id, user id and request id, never a body, a header, a password, a token or a cookie;
 * anything that tries to is redacted.
 */
const REDACT = [
  'password',
  '*.password',
  'passwordHash',
  '*.passwordHash',
  'token',
  '*.token',
  'cookie',
  '*.cookie',
  'headers',
  '*.headers',
  'authorization',
  '*.authorization',
  'csrfToken',
  '*.csrfToken',
];

const holder = globalThis as typeof globalThis & { __kerfwiseLog?: Logger };

function create(destination?: DestinationStream, level = process.env.LOG_LEVEL || 'info'): Logger {
  const options = { level, base: { app: 'kerfwise' }, redact: { paths: REDACT, censor: '[redacted]' } };
  if (destination) return pino(options, destination);
  if (process.env.NODE_ENV === 'development') {
    // pino-pretty as a stream in this thread: no transport worker for the bundler to trace.
    return pino(options, pretty({ colorize: true, translateTime: 'HH:MM:ss.l', ignore: 'pid,hostname,app' }));
  }
  return pino(options);
}

export function log(): Logger {
  return (holder.__kerfwiseLog ??= create());
}

/** Sends the logs, from `level` up, to a stream of the caller's (tests read the lines). */
export function logTo(destination: DestinationStream, level = 'info'): void {
  holder.__kerfwiseLog = create(destination, level);
}

const UUID = /[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}/gi;

/** The route a path belongs to: ids replaced by `:id`, so lines group by route. */
export function routeOf(pathname: string): string {
  return pathname.replace(UUID, ':id');
}

/** The request's id: the one a proxy in front sent (when it looks like an id), or a new one. */
export function requestIdOf(headers: Pick<Headers, 'get'>): string {
  const sent = headers.get('x-request-id');
  return sent && /^[A-Za-z0-9._:-]{8,100}$/.test(sent) ? sent : crypto.randomUUID();
}
