/**
 * Dates in the shop's own time zone. Timestamps are stored in UTC; a shop reads them on its own clock, so a plan
 * finished at 23:30 in Chicago belongs to that evening's day, week and month, not to tomorrow's (UTC's).
 */

/** Whether `zone` is an IANA time zone this runtime knows (`America/Chicago`, `Europe/Berlin`, `UTC`). */
export function isTimeZone(zone: string): boolean {
  if (!/^[A-Za-z_]+(\/[A-Za-z0-9_+-]+)*$/.test(zone)) return false;
  try {
    new Intl.DateTimeFormat('en-US', { timeZone: zone });
    return true;
  } catch {
    return false;
  }
}

/** Every zone the runtime lists, for a picker, with UTC first. */
export function timeZoneChoices(): string[] {
  const listed = typeof Intl.supportedValuesOf === 'function' ? Intl.supportedValuesOf('timeZone') : [];
  return ['UTC', ...listed.filter((z) => z !== 'UTC')];
}

/**
 * One formatter per locale, zone and style, made once: making an Intl.DateTimeFormat costs a hundred times what
 * formatting with it does (a list of 25 rows made 25 of them on every render).
 */
const formatters = new Map<string, Intl.DateTimeFormat>();
function formatter(locale: string, zone: string, style: 'day' | 'date-time'): Intl.DateTimeFormat {
  const key = `${locale}|${zone}|${style}`;
  let f = formatters.get(key);
  if (!f) {
    // en-CA writes dates as YYYY-MM-DD.
    const options: Intl.DateTimeFormatOptions =
      style === 'day'
        ? { timeZone: zone, year: 'numeric', month: '2-digit', day: '2-digit' }
        : { timeZone: zone, dateStyle: 'medium', timeStyle: 'short' };
    f = new Intl.DateTimeFormat(locale, options);
    // Only formatters that were made (a zone the runtime knows) are kept; a few hundred zones at most.
    if (formatters.size >= 500) formatters.clear();
    formatters.set(key, f);
  }
  return f;
}

/** The calendar day of `at` in `zone`, as `YYYY-MM-DD`. */
export function shopDay(at: Date, zone: string): string {
  if (Number.isNaN(at.getTime())) throw new RangeError('shopDay needs a valid date.');
  return formatter('en-CA', zone, 'day').format(at);
}

/** A date and time as the shop reads it: "Dec 3, 2026, 5:30 PM" in its zone. */
export function formatShopDateTime(at: Date, zone: string, locale = 'en-US'): string {
  return formatter(locale, zone, 'date-time').format(at);
}

/** Periods the reports group by. Weeks start on Monday (ISO 8601), as PostgreSQL's date_trunc('week') does. */
export const REPORT_PERIODS = ['week', 'month'] as const;
export type ReportPeriod = (typeof REPORT_PERIODS)[number];

/** The first day (`YYYY-MM-DD`) of the week or month that the shop day `day` falls in. */
export function periodStart(day: string, by: ReportPeriod): string {
  const m = /^(\d{4})-(\d{2})-(\d{2})$/.exec(day);
  if (!m) throw new RangeError(`"${day}" is not a YYYY-MM-DD day.`);
  if (by === 'month') return `${m[1]}-${m[2]}-01`;
  const d = new Date(Date.UTC(Number(m[1]), Number(m[2]) - 1, Number(m[3])));
  const back = (d.getUTCDay() + 6) % 7; // days since Monday
  d.setUTCDate(d.getUTCDate() - back);
  return d.toISOString().slice(0, 10);
}

/** Every period start (`YYYY-MM-DD`) from the one holding `from` to the one holding `to`, in order. */
export function periodsBetween(from: string, to: string, by: ReportPeriod): string[] {
  const out: string[] = [];
  const end = periodStart(to, by);
  let at = periodStart(from, by);
  while (at <= end && out.length < 1000) {
    out.push(at);
    const d = new Date(`${at}T00:00:00Z`);
    if (by === 'month') d.setUTCMonth(d.getUTCMonth() + 1, 1);
    else d.setUTCDate(d.getUTCDate() + 7);
    at = d.toISOString().slice(0, 10);
  }
  return out;
}
