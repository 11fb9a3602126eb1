import 'server-only';
import { RateLimiterMemory, RateLimiterPostgres, type RateLimiterAbstract } from 'rate-limiter-flexible';
import { HttpError } from './errors';

/**
 * Attempt limits, one place for every route that must not be guessed at: sign-in (by account and by address) now,
 * password reset, invite acceptance and the customer's quote page when they come. Each kind allows `points`
 * counted attempts in a window of `seconds` from the first; past that, it is refused until the window ends.
 * On the embedded database the counts live in this process's memory (there is only one app server); with
 * DATABASE_URL they live in PostgreSQL's `rate_limits` table, so every app server on it sees the same count.
 */
export const LIMITS = {
  /** Wrong passwords for one e-mail address (known or not: the answer must not tell). */
  'sign-in:account': { points: 10, seconds: 15 * 60 },
  /** Wrong passwords from one client address, across e-mail addresses. */
  'sign-in:address': { points: 100, seconds: 15 * 60 },
  'password-reset': { points: 5, seconds: 60 * 60 },
  'invite-accept': { points: 10, seconds: 15 * 60 },
  'quote-page': { points: 300, seconds: 60 },
} as const satisfies Record<string, { points: number; seconds: number }>;

export type LimitKind = keyof typeof LIMITS;

export interface LimitState {
  /** True when the kind's attempts for this key are used up. */
  blocked: boolean;
  /** Whole seconds until the window ends (0 when nothing is counted). */
  retryAfterSeconds: number;
  remaining: number;
}

export interface LimiterStore {
  /** A node-postgres pool on the shared database, or null for this process's memory. */
  pool: import('pg').Pool | null;
}

type Limiters = Map<LimitKind, RateLimiterAbstract>;
const holder = globalThis as typeof globalThis & { __kerfwiseLimiters?: Limiters; __kerfwiseLimiterPool?: import('pg').Pool };

/** Limiters on the given store (tests make their own; the app uses `limiters()`). */
export function createLimiters(store: LimiterStore): Limiters {
  const map: Limiters = new Map();
  for (const [kind, rule] of Object.entries(LIMITS) as [LimitKind, (typeof LIMITS)[LimitKind]][]) {
    const common = { keyPrefix: kind, points: rule.points, duration: rule.seconds };
    map.set(
      kind,
      store.pool
        ? new RateLimiterPostgres({
            ...common,
            storeClient: store.pool,
            storeType: 'pool',
            tableName: 'rate_limits',
            tableCreated: true,
            clearExpiredByTimeout: true,
          })
        : new RateLimiterMemory(common),
    );
  }
  return map;
}

async function limiters(): Promise<Limiters> {
  if (holder.__kerfwiseLimiters) return holder.__kerfwiseLimiters;
  const url = process.env.DATABASE_URL;
  let pool: import('pg').Pool | null = null;
  if (url && /^postgres(ql)?:\/\//.test(url)) {
    const { Pool } = await import('pg');
    pool = holder.__kerfwiseLimiterPool ??= new Pool({ connectionString: url, max: 2 });
    pool.on('error', (error) => console.error(`PostgreSQL closed an idle limiter connection (${error.message}).`));
  }
  holder.__kerfwiseLimiters ??= createLimiters({ pool });
  return holder.__kerfwiseLimiters;
}

function stateOf(kind: LimitKind, res: { consumedPoints: number; msBeforeNext: number } | null): LimitState {
  const { points } = LIMITS[kind];
  if (!res) return { blocked: false, retryAfterSeconds: 0, remaining: points };
  const retryAfterSeconds = Math.max(1, Math.ceil(res.msBeforeNext / 1000));
  return { blocked: res.consumedPoints >= points, retryAfterSeconds, remaining: Math.max(0, points - res.consumedPoints) };
}

/** Where `key` stands for `kind`, without counting an attempt. */
export async function limit(kind: LimitKind, key: string, from?: Limiters): Promise<LimitState> {
  const limiter = (from ?? (await limiters())).get(kind)!;
  return stateOf(kind, await limiter.get(key));
}

/** Counts one attempt (a wrong password, say) and answers where the key stands after it. */
export async function spend(kind: LimitKind, key: string, from?: Limiters): Promise<LimitState> {
  const limiter = (from ?? (await limiters())).get(kind)!;
  try {
    return stateOf(kind, await limiter.consume(key, 1));
  } catch (rejection) {
    // Over the limit: rate-limiter-flexible rejects with the counter's state; anything else is a real error.
    if (rejection instanceof Error) throw rejection;
    return stateOf(kind, rejection as { consumedPoints: number; msBeforeNext: number });
  }
}

/** Clears the count (a right password clears its account's wrong ones). */
export async function forgive(kind: LimitKind, key: string, from?: Limiters): Promise<void> {
  await (from ?? (await limiters())).get(kind)!.delete(key);
}

/** The 429 for a used-up limit, with Retry-After. */
export function tooManyAttempts(state: LimitState, what = 'attempts'): HttpError {
  const minutes = Math.ceil(state.retryAfterSeconds / 60);
  return new HttpError(429, `Too many ${what}. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`, undefined, {
    'Retry-After': String(state.retryAfterSeconds),
  });
}

/**
 * The client's address as the nearest proxy saw it: the last X-Forwarded-For entry (Next.js fills it from the
 * socket when no proxy sent one; a proxy appends the address it saw, so entries a client forged come first).
 */
export function clientAddress(headers: Pick<Headers, 'get'>): string {
  const forwarded = headers.get('x-forwarded-for');
  const last = forwarded
    ?.split(',')
    .map((s) => s.trim())
    .filter(Boolean)
    .pop();
  return (last ?? headers.get('x-real-ip') ?? 'unknown').toLowerCase();
}
