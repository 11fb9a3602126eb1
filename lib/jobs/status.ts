import type { Role } from '@/lib/auth/permissions';
import { JOB_STATUS_LABELS, JOB_STATUSES, type JobStatus } from '@/shared/schemas/job';

/**
 * A job's status as a shop reads it: quoting → quoted (a quote revision sent) → won (a person says so; later a paid deposit) → cutting (a plan is
 * released or a saw-order step ticked) → done (every released plan finished and no re-cut open) → archived.
 * Cutting and done follow the plans; quoting, won and archived are set by people.
 */
export interface JobFacts {
  /** Plans released to the saw or being cut. */
  activePlans: number;
  /** Plans finished. */
  donePlans: number;
  /** Re-cuts still to cut (open or in a released re-cut plan). */
  openRecuts: number;
  /** Someone (or a deposit) marked the job won. */
  won: boolean;
  /** A revision of the job's quote was marked sent. */
  quoted?: boolean;
}

/** What the plans say the job is: cutting while anything is at the saw or still to re-cut, done once all is cut. */
export function statusFromPlans(facts: JobFacts): Exclude<JobStatus, 'archived'> {
  if (facts.activePlans > 0) return 'cutting';
  if (facts.donePlans > 0) return facts.openRecuts > 0 ? 'cutting' : 'done';
  // Nothing at the saw and nothing cut (every released plan cancelled): back to where it was before cutting.
  return facts.won ? 'won' : facts.quoted ? 'quoted' : 'quoting';
}

/** The status after a plan or re-cut changed: an archived job stays archived; any other follows its plans. */
export function followPlans(current: JobStatus, facts: JobFacts): JobStatus {
  return current === 'archived' ? 'archived' : statusFromPlans(facts);
}

const WHY: Record<JobStatus, string> = {
  quoting: 'its plans are at the saw or cut',
  quoted: 'a job is quoted when a revision of its quote is sent',
  won: 'its plans are at the saw or cut',
  cutting: 'cutting starts when a plan is released or a saw-order step is ticked',
  done: 'a job is done when every released plan is finished and no re-cut is open',
  archived: 'finish or cancel the plans at the saw first',
};

/**
 * The statuses a person may pick by hand (the current one included). The owner may set any. Others the ordinary
 * ones: quoting ⇄ won, archive a quote, a won job or a done one, and restore an archived job to what its plans say.
 */
export function manualStatusChoices(role: Role, current: JobStatus, facts: JobFacts): JobStatus[] {
  if (role === 'owner') return [...JOB_STATUSES];
  const restored = statusFromPlans(facts);
  const next: Record<JobStatus, JobStatus[]> = {
    quoting: ['quoting', 'won', 'archived'],
    quoted: ['quoting', 'quoted', 'won', 'archived'],
    won: ['quoting', 'won', 'archived'],
    cutting: ['cutting'],
    done: ['done', 'archived'],
    archived: [restored, 'archived'],
  };
  return next[current];
}

/** Null when the person may set `to` by hand; otherwise the reason, as a sentence. */
export function refuseManualStatus(role: Role, current: JobStatus, to: JobStatus, facts: JobFacts): string | null {
  if (manualStatusChoices(role, current, facts).includes(to)) return null;
  if (current === 'archived') return `An archived job is restored to ${JOB_STATUS_LABELS[statusFromPlans(facts)]}, what its plans say; only the owner can set another status by hand.`;
  return `A ${JOB_STATUS_LABELS[current].toLowerCase()} job cannot be set to ${JOB_STATUS_LABELS[to]} by hand: ${WHY[to]}. Only the owner can override that.`;
}

/** When the job was won after a status set by hand: kept, set now, or cleared (back to quoting). */
export function wonAtAfter(to: JobStatus, wonAt: Date | null, now: Date): Date | null {
  if (to === 'quoting' || to === 'quoted') return null;
  if (to === 'won') return wonAt ?? now;
  return wonAt;
}
