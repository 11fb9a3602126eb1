import { bigint, integer, pgTable, varchar } from 'drizzle-orm/pg-core';

/**
 * Attempt counters (sign-in by account and by address, and later routes) shared by every app server on one
 * PostgreSQL (server/api/limit.ts). The columns are the ones rate-limiter-flexible's PostgreSQL store reads and writes:
 * key is `<kind>:<key>`, expire is milliseconds since the epoch. The embedded database keeps its counts in memory.
 */
export const rateLimits = pgTable('rate_limits', {
  key: varchar('key', { length: 255 }).primaryKey(),
  points: integer('points').notNull().default(0),
  expire: bigint('expire', { mode: 'number' }),
});
