/**
 * When the low-stock digest is due, on the shop's clock. Pure: the scheduler (lib/buying/digest-service.ts) asks
 * every minute or so; the database's one row per shop per local day (low_stock_digests) makes "once a day" hold
 * across app servers.
 */
import { isLowStock } from '@/lib/stock/low-stock';

/** `HH:MM` on a 24-hour clock, 00:00–23:59. */
export const DIGEST_TIME = /^([01]\d|2[0-3]):[0-5]\d$/;

/** The shop's local day (YYYY-MM-DD) and time (HH:MM) at `now`. */
export function shopClock(now: Date, zone: string): { day: string; time: string } {
  const parts = Object.fromEntries(
    new Intl.DateTimeFormat('en-CA', {
      timeZone: zone,
      year: 'numeric',
      month: '2-digit',
      day: '2-digit',
      hour: '2-digit',
      minute: '2-digit',
      hourCycle: 'h23',
    })
      .formatToParts(now)
      .map((p) => [p.type, p.value]),
  );
  return { day: `${parts.year}-${parts.month}-${parts.day}`, time: `${parts.hour}:${parts.minute}` };
}

/**
 * Whether the digest is due now: the shop sends one (`at` is a time, not ''), its local clock has reached `at`
 * today, and today's digest was not already made (`lastDay`, the latest local day one was made). On a day the
 * clocks skip the hour the digest time falls in, it goes at the first minute after the gap.
 */
export function digestDue({ now, zone, at, lastDay }: { now: Date; zone: string; at: string; lastDay: string | null }): {
  due: boolean;
  day: string;
} {
  const { day, time } = shopClock(now, zone);
  if (!DIGEST_TIME.test(at)) return { due: false, day };
  return { due: time >= at && (lastDay === null || lastDay < day), day };
}

export interface DigestSize {
  id: string;
  onHand: number;
  reserved: number;
  lowStockAt: number;
}

/** The sizes the digest lists: below their mark and on no open purchase order (draft, sent or part received). */
export function digestSizes<T extends DigestSize>(sizes: readonly T[], onOpenOrder: ReadonlySet<string>): T[] {
  return sizes.filter((s) => isLowStock(s) && !onOpenOrder.has(s.id));
}
