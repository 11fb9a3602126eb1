/**
 * The server's round of quote expiry: every 10 minutes (and once at start), quotes left unanswered past their last
 * valid day become expired (db/queries/quote-answers.ts expireQuotes). Several app servers may run it at once: the
 * rows are locked, so each quote expires once.
 */
import type { Db } from '@/db/open';
import { expireQuotes } from '@/db/queries/quote-answers';

const EVERY_MS = 10 * 60_000;
const holder = globalThis as typeof globalThis & { __kerfwiseExpiry?: NodeJS.Timeout };

export function startQuoteExpiry(db: Db): void {
  if (holder.__kerfwiseExpiry) return;
  const round = () =>
    void expireQuotes(db).catch((error: unknown) => console.error(`Quote expiry round failed: ${error instanceof Error ? error.message : error}`));
  round();
  holder.__kerfwiseExpiry = setInterval(round, EVERY_MS);
  holder.__kerfwiseExpiry.unref();
}

export function stopQuoteExpiry(): void {
  clearInterval(holder.__kerfwiseExpiry);
  holder.__kerfwiseExpiry = undefined;
}
