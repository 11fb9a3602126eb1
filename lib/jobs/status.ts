import type { Role } from '@/lib/auth/permissions';
import { JOB_STATUS_LABELS, JOB_STATUSES, type JobStatus } from '@/shared/schemas/job';

/**
 * A job's status as a shop reads it:
 * quoting → quoted (a quote revision sent) → accepted (the customer accepted it on their page, or a person says the
 * work is agreed) → deposit paid (the deposit came in through the payments service) → cutting (a plan is released or
 * a saw-order step ticked) → done (every released plan finished and no re-cut open) → archived; a quote the customer
 * declined, or one left unanswered past its validity, makes the job declined or expired.
 * Cutting and done follow the plans; deposit paid follows the payments; quoted, declined and expired follow the
 * quotes; quoting, accepted and archived may also be set by people.
 */
export interface JobFacts {
  /** Plans released to the saw or being cut. */
  activePlans: number;
  /** Plans finished. */
  donePlans: number;
  /** Re-cuts still to cut (open or in a released re-cut plan). */
  openRecuts: number;
  /** The customer accepted a quote, or someone marked the job accepted. */
  accepted: boolean;
  /** A revision of the job's quote is out with the customer, unanswered and still valid. */
  quoted?: boolean;
  /** A deposit was paid (and not refunded). */
  depositPaid?: boolean;
  /** What became of the job's last quote answered or run out, when no quote is out or accepted. */
  lastQuote?: 'declined' | 'expired' | null;
}

/** What the plans, the payments and the quotes say the job is, in that order. */
export function statusFromPlans(facts: JobFacts): Exclude<JobStatus, 'archived'> {
  if (facts.activePlans > 0) return 'cutting';
  if (facts.donePlans > 0) return facts.openRecuts > 0 ? 'cutting' : 'done';
  // Nothing at the saw and nothing cut (every released plan cancelled): back to where it was before cutting.
  if (facts.depositPaid) return 'deposit-paid';
  if (facts.accepted) return 'accepted';
  if (facts.quoted) return 'quoted';
  return facts.lastQuote ?? 'quoting';
}

/** The status after a plan, a re-cut, a quote or a payment changed: an archived job stays archived; any other follows them. */
export function followPlans(current: JobStatus, facts: JobFacts): JobStatus {
  return current === 'archived' ? 'archived' : statusFromPlans(facts);
}

const WHY: Record<JobStatus, string> = {
  quoting: 'its plans are at the saw or cut',
  quoted: 'a job is quoted when a revision of its quote is sent',
  accepted: 'its plans are at the saw or cut',
  'deposit-paid': 'a job is deposit paid when the customer pays the deposit online',
  declined: 'a job is declined when the customer declines its quote',
  expired: 'a job is expired when its quote runs past its validity unanswered',
  cutting: 'cutting starts when a plan is released or a saw-order step is ticked',
  done: 'a job is done when every released plan is finished and no re-cut is open',
  archived: 'finish or cancel the plans at the saw first',
};

/**
 * The statuses a person may pick by hand (the current one included). The owner may set any. Others the ordinary
 * ones: quoting ⇄ accepted (a declined or expired job too, when the customer comes back), archive a quote, an
 * accepted job or a done one, and restore an archived job to what its plans say.
 */
export function manualStatusChoices(role: Role, current: JobStatus, facts: JobFacts): JobStatus[] {
  if (role === 'owner') return [...JOB_STATUSES];
  const restored = statusFromPlans(facts);
  const next: Record<JobStatus, JobStatus[]> = {
    quoting: ['quoting', 'accepted', 'archived'],
    quoted: ['quoting', 'quoted', 'accepted', 'archived'],
    accepted: ['quoting', 'accepted', 'archived'],
    'deposit-paid': ['deposit-paid', 'archived'],
    cutting: ['cutting'],
    done: ['done', 'archived'],
    declined: ['quoting', 'declined', 'accepted', 'archived'],
    expired: ['quoting', 'expired', 'accepted', 'archived'],
    archived: [restored, 'archived'],
  };
  return next[current];
}

/** Null when the person may set `to` by hand; otherwise the reason, as a sentence. */
export function refuseManualStatus(role: Role, current: JobStatus, to: JobStatus, facts: JobFacts): string | null {
  if (manualStatusChoices(role, current, facts).includes(to)) return null;
  if (current === 'archived')
    return `An archived job is restored to ${JOB_STATUS_LABELS[statusFromPlans(facts)]}, what its plans say; only the owner can set another status by hand.`;
  const label = JOB_STATUS_LABELS[current].toLowerCase();
  return `${/^[aeiou]/.test(label) ? 'An' : 'A'} ${label} job cannot be set to ${JOB_STATUS_LABELS[to]} by hand: ${WHY[to]}. Only the owner can override that.`;
}

/** When the job was accepted, after a status set by hand: kept, set now, or cleared (back to quoting, quoted, declined or expired). */
export function acceptedAtAfter(to: JobStatus, acceptedAt: Date | null, now: Date): Date | null {
  if (to === 'quoting' || to === 'quoted' || to === 'declined' || to === 'expired') return null;
  if (to === 'accepted') return acceptedAt ?? now;
  return acceptedAt;
}
