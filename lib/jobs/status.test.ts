import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { JOB_STATUSES, type JobStatus } from '@/shared/schemas/job';
import { followPlans, manualStatusChoices, refuseManualStatus, statusFromPlans, wonAtAfter, type JobFacts } from './status';

// How a cabinet shop runs a job (common practice, no source): quoted, won, cut, done, then filed away.
const facts = (f: Partial<JobFacts> = {}): JobFacts => ({ activePlans: 0, donePlans: 0, openRecuts: 0, won: false, quoted: false, ...f });

describe('a job follows its plans', () => {
  test.each([
    ['nothing released, not won: quoting', facts(), 'quoting'],
    ['nothing released, a quote sent: quoted', facts({ quoted: true }), 'quoted'],
    ['a quoted job whose only released plan was cancelled: back to quoted', facts({ quoted: true }), 'quoted'],
    ['won after a quote was sent: won', facts({ quoted: true, won: true }), 'won'],
    ['nothing released, won: won', facts({ won: true }), 'won'],
    ['a plan released or being cut: cutting', facts({ activePlans: 1, won: true }), 'cutting'],
    ['a quote released to the saw before anyone said won: cutting', facts({ activePlans: 1 }), 'cutting'],
    ['one plan done, another still at the saw: cutting', facts({ activePlans: 1, donePlans: 1, won: true }), 'cutting'],
    ['every released plan done, no re-cut open: done', facts({ donePlans: 2, won: true }), 'done'],
    ['every plan done but a re-cut open: still cutting', facts({ donePlans: 1, openRecuts: 1, won: true }), 'cutting'],
    ['the only released plan cancelled on a won job: back to won', facts({ won: true }), 'won'],
  ] as const)('%s', (_label, f, expected) => {
    expect(statusFromPlans(f)).toBe(expected);
  });

  test('an archived job stays archived whatever its plans do; any other status follows them', () => {
    const anyFacts = fc.record({ activePlans: fc.nat(3), donePlans: fc.nat(3), openRecuts: fc.nat(3), won: fc.boolean() });
    fc.assert(
      fc.property(fc.constantFrom(...JOB_STATUSES), anyFacts, (current, f) => {
        expect(followPlans(current, f)).toBe(current === 'archived' ? 'archived' : statusFromPlans(f));
      }),
      { seed: 20270122 },
    );
  });
});

describe('statuses set by hand', () => {
  test('the owner may set any status from any status', () => {
    for (const from of JOB_STATUSES) for (const to of JOB_STATUSES) expect(refuseManualStatus('owner', from, to, facts())).toBeNull();
  });

  test.each([
    ['quoting', 'won', facts(), true],
    ['quoted', 'won', facts({ quoted: true }), true],
    ['quoted', 'quoting', facts({ quoted: true }), true],
    ['quoting', 'quoted', facts(), false],
    ['won', 'quoting', facts({ won: true }), true],
    ['quoting', 'archived', facts(), true],
    ['won', 'archived', facts({ won: true }), true],
    ['done', 'archived', facts({ donePlans: 1 }), true],
    ['quoting', 'cutting', facts(), false],
    ['won', 'done', facts({ won: true }), false],
    ['cutting', 'won', facts({ activePlans: 1 }), false],
    ['cutting', 'archived', facts({ activePlans: 1 }), false],
    ['done', 'quoting', facts({ donePlans: 1 }), false],
    ['archived', 'done', facts({ donePlans: 1 }), true],
    ['archived', 'won', facts({ donePlans: 1 }), false],
    ['archived', 'quoting', facts(), true],
  ] as [JobStatus, JobStatus, JobFacts, boolean][])('an estimator setting %s → %s: allowed %s', (from, to, f, allowed) => {
    const refused = refuseManualStatus('estimator', from, to, f);
    if (allowed) expect(refused).toBeNull();
    else expect(refused).toMatch(/by hand|restored/);
  });

  test('an estimator restores an archived job to what its plans say, and is told so otherwise', () => {
    expect(manualStatusChoices('estimator', 'archived', facts({ won: true }))).toEqual(['won', 'archived']);
    expect(refuseManualStatus('estimator', 'archived', 'cutting', facts({ won: true }))).toBe(
      'An archived job is restored to Won, what its plans say; only the owner can set another status by hand.',
    );
    expect(refuseManualStatus('estimator', 'won', 'cutting', facts({ won: true }))).toBe(
      'A won job cannot be set to Cutting by hand: cutting starts when a plan is released or a saw-order step is ticked. Only the owner can override that.',
    );
  });

  test('marking a job won records when, once; setting it back to quoting clears it; other statuses keep it', () => {
    const then = new Date('2026-11-02T15:00:00Z');
    const now = new Date('2026-12-01T09:00:00Z');
    expect(wonAtAfter('won', null, now)).toBe(now);
    expect(wonAtAfter('won', then, now)).toBe(then);
    expect(wonAtAfter('quoting', then, now)).toBeNull();
    expect(wonAtAfter('archived', then, now)).toBe(then);
    expect(wonAtAfter('done', null, now)).toBeNull();
  });
});
