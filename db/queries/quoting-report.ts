/**
 * The quoting report (owner and estimator): per period on the shop's clock, the quote revisions sent, accepted,
 * declined and expired, the value won (accepted revisions' totals) and the deposits collected (payments paid, less
 * those refunded); and per job won in the range, the material the quote priced at cost against what its finished
 * plans actually used (the yield ledger's material cost). Counts and sums are grouped in the database; only the
 * accepted revisions of the range are read to total their lines (lib/costing's rules, as the quote showed them).
 */
import { sql } from 'drizzle-orm';
import type { Db } from '../open';
import { quoteNumberText, revisionLetter } from '@/shared/schemas/quote';
import type { QuoteLine } from '@/shared/schemas/quote';
import type { QuotingFigures } from '@/lib/reports/quoting-report';
import { revisionTotals } from './quotes';
import { inRange, jobIs, periodOf, rowsOf, type ReportFilter } from './reports';

/** One period's quotes and money (lib/reports/quoting-report.ts has the CSV of it). */
export type QuotingPeriod = QuotingFigures;

export interface QuotedAgainstUsed {
  jobId: string;
  jobName: string;
  title: string;
  acceptedOn: string;
  /** The material lines of the accepted revision, at cost. */
  quotedMaterialMinor: number;
  /** Material cost of the job's finished plans; null while none is finished. */
  usedMaterialMinor: number | null;
  finishedPlans: number;
}

type AcceptedRow = {
  period: string;
  job_id: string;
  job_name: string;
  number: number;
  revision: number;
  accepted_on: string;
  currency: string;
  lines: QuoteLine[];
  markup_material_percent: number;
  markup_hardware_percent: number;
  discount: { kind: 'percent'; percent: number } | { kind: 'amount'; minor: number };
  tax_percent: number;
  deposit_percent: number;
  used: number | null;
  finished: number;
};

export async function quotingReport(db: Db, f: ReportFilter): Promise<{ periods: QuotingPeriod[]; jobs: QuotedAgainstUsed[] }> {
  const [events, deposits, accepted] = await Promise.all([quoteEvents(db, f), depositsByPeriod(db, f), acceptedQuotes(db, f)]);

  const periods = new Map<string, QuotingPeriod>();
  const period = (p: string) =>
    periods.get(p) ?? periods.set(p, { period: p, sent: 0, accepted: 0, declined: 0, expired: 0, wonMinor: 0, depositsMinor: 0 }).get(p)!;
  for (const r of rowsOf<{ period: string; kind: 'sent' | 'accepted' | 'declined' | 'expired'; n: number }>(events))
    period(r.period)[r.kind] += Number(r.n);
  for (const r of rowsOf<{ period: string; minor: string | number }>(deposits)) period(r.period).depositsMinor += Number(r.minor);
  const jobs: QuotedAgainstUsed[] = [];
  for (const r of rowsOf<AcceptedRow>(accepted)) {
    const totals = revisionTotals({
      currency: r.currency,
      lines: r.lines,
      markupMaterialPercent: Number(r.markup_material_percent),
      markupHardwarePercent: Number(r.markup_hardware_percent),
      discount: r.discount,
      taxPercent: Number(r.tax_percent),
      depositPercent: Number(r.deposit_percent),
    });
    period(r.period).wonMinor += totals.totalMinor;
    jobs.push({
      jobId: r.job_id,
      jobName: r.job_name,
      title: `${quoteNumberText(Number(r.number))} rev ${revisionLetter(Number(r.revision))}`,
      acceptedOn: r.accepted_on,
      quotedMaterialMinor: r.lines.reduce((sum, l, i) => sum + (l.kind === 'material' ? totals.lines[i].costMinor : 0), 0),
      usedMaterialMinor: Number(r.finished) > 0 ? Number(r.used ?? 0) : null,
      finishedPlans: Number(r.finished),
    });
  }
  return { periods: [...periods.values()].sort((a, b) => a.period.localeCompare(b.period)), jobs };
}

/** Revisions sent, answered and expired, counted per period of the shop's clock. */
function quoteEvents(db: Db, f: ReportFilter) {
  const at = sql.raw('e.at');
  return db.execute(sql`
    select ${periodOf(at, f)} as period, e.kind, count(*)::int as n
      from (
        select r.sent_at as at, 'sent' as kind from quote_revisions r where r.shop_id = ${f.shopId} and r.sent_at is not null ${jobIs(sql.raw('r.job_id'), f)}
        union all
        select r.answered_at, r.status::text from quote_revisions r where r.shop_id = ${f.shopId} and r.status in ('accepted', 'declined') ${jobIs(sql.raw('r.job_id'), f)}
        union all
        -- A quote expires at the start of the day after its last valid day, on the shop's clock.
        select ((r.valid_until + 1)::timestamp at time zone ${f.timeZone}), 'expired' from quote_revisions r where r.shop_id = ${f.shopId} and r.status = 'expired' ${jobIs(sql.raw('r.job_id'), f)}
      ) e
     where ${inRange(at, f)}
     group by 1, 2`);
}

/** Deposits paid less deposits refunded, per period. */
function depositsByPeriod(db: Db, f: ReportFilter) {
  const at = sql.raw('e.at');
  return db.execute(sql`
    select ${periodOf(at, f)} as period, sum(e.amount)::bigint as minor
      from (
        select p.paid_at as at, p.amount_minor as amount from quote_payments p where p.shop_id = ${f.shopId} and p.paid_at is not null ${jobIs(sql.raw('p.job_id'), f)}
        union all
        select p.refunded_at, -p.amount_minor from quote_payments p where p.shop_id = ${f.shopId} and p.refunded_at is not null ${jobIs(sql.raw('p.job_id'), f)}
      ) e
     where ${inRange(at, f)}
     group by 1`);
}

/** The quotes accepted in the range with their jobs, and each job's finished plans summed once (a job may have many plans and several accepted quotes). */
function acceptedQuotes(db: Db, f: ReportFilter) {
  return db.execute(sql`
    with accepted as (
      select ${periodOf(sql.raw('r.answered_at'), f)} as period, j.id as job_id, j.name as job_name, q.number, r.revision, r.answered_at,
             to_char(r.answered_at at time zone ${f.timeZone}, 'YYYY-MM-DD') as accepted_on, r.currency, r.lines,
             r.markup_material_percent, r.markup_hardware_percent, r.discount, r.tax_percent, r.deposit_percent
        from quote_revisions r join quotes q on q.id = r.quote_id join jobs j on j.id = r.job_id
       where r.shop_id = ${f.shopId} and r.status = 'accepted' and ${inRange(sql.raw('r.answered_at'), f)} ${jobIs(sql.raw('r.job_id'), f)}
    ),
    used as (
      select p.job_id, sum(p.cost_cents)::bigint as used, count(*)::int as finished
        from plans p
       where p.shop_id = ${f.shopId} and p.status = 'done' and p.job_id in (select job_id from accepted)
       group by p.job_id
    )
    select a.*, u.used, coalesce(u.finished, 0) as finished
      from accepted a left join used u on u.job_id = a.job_id
     order by a.answered_at`);
}
