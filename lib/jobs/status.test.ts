import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { JOB_STATUSES, type JobStatus } from '@/shared/schemas/job';
import { followPlans, manualStatusChoices, refuseManualStatus, statusFromPlans, acceptedAtAfter, type JobFacts } from './status';

// How a cabinet shop runs a job (common practice, no source): quoted, accepted, cut, done, then filed away.
const facts = (f: Partial<JobFacts> = {}): JobFacts => ({ activePlans: 0, donePlans: 0, openRecuts: 0, accepted: false, quoted: false, ...f });

describe('a job follows its plans', () => {
  test.each([
    ['nothing released, not accepted: quoting', facts(), 'quoting'],
    ['nothing released, a quote sent: quoted', facts({ quoted: true }), 'quoted'],
    ['a quoted job whose only released plan was cancelled: back to quoted', facts({ quoted: true }), 'quoted'],
    ['accepted after a quote was sent: accepted', facts({ quoted: true, accepted: true }), 'accepted'],
    ['nothing released, accepted: accepted', facts({ accepted: true }), 'accepted'],
    ['a plan released or being cut: cutting', facts({ activePlans: 1, accepted: true }), 'cutting'],
    ['a quote released to the saw before anyone said accepted: cutting', facts({ activePlans: 1 }), 'cutting'],
    ['one plan done, another still at the saw: cutting', facts({ activePlans: 1, donePlans: 1, accepted: true }), 'cutting'],
    ['every released plan done, no re-cut open: done', facts({ donePlans: 2, accepted: true }), 'done'],
    ['every plan done but a re-cut open: still cutting', facts({ donePlans: 1, openRecuts: 1, accepted: true }), 'cutting'],
    ['the only released plan cancelled on an accepted job: back to accepted', facts({ accepted: true }), 'accepted'],
    ['the deposit paid, nothing released: deposit paid', facts({ quoted: false, accepted: true, depositPaid: true }), 'deposit-paid'],
    ['a plan released after the deposit: cutting', facts({ accepted: true, depositPaid: true, activePlans: 1 }), 'cutting'],
    ['the deposit refunded (no longer paid): back to accepted', facts({ accepted: true, depositPaid: false }), 'accepted'],
    ['the only quote declined: declined', facts({ lastQuote: 'declined' }), 'declined'],
    ['the only quote ran past its validity: expired', facts({ lastQuote: 'expired' }), 'expired'],
    ['one quote declined, a newer one out: quoted', facts({ quoted: true, lastQuote: 'declined' }), 'quoted'],
    ['marked accepted by hand after a decline: accepted', facts({ accepted: true, lastQuote: 'declined' }), 'accepted'],
  ] as const)('%s', (_label, f, expected) => {
    expect(statusFromPlans(f)).toBe(expected);
  });

  test('an archived job stays archived whatever its plans do; any other status follows them', () => {
    const anyFacts = fc.record({
      activePlans: fc.nat(3),
      donePlans: fc.nat(3),
      openRecuts: fc.nat(3),
      accepted: fc.boolean(),
      quoted: fc.boolean(),
      depositPaid: fc.boolean(),
      lastQuote: fc.constantFrom('declined' as const, 'expired' as const, null),
    });
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
    ['quoting', 'accepted', facts(), true],
    ['quoted', 'accepted', facts({ quoted: true }), true],
    ['quoted', 'quoting', facts({ quoted: true }), true],
    ['quoting', 'quoted', facts(), false],
    ['accepted', 'quoting', facts({ accepted: true }), true],
    ['quoting', 'archived', facts(), true],
    ['accepted', 'archived', facts({ accepted: true }), true],
    ['done', 'archived', facts({ donePlans: 1 }), true],
    ['quoting', 'cutting', facts(), false],
    ['accepted', 'done', facts({ accepted: true }), false],
    ['cutting', 'accepted', facts({ activePlans: 1 }), false],
    ['cutting', 'archived', facts({ activePlans: 1 }), false],
    ['done', 'quoting', facts({ donePlans: 1 }), false],
    ['archived', 'done', facts({ donePlans: 1 }), true],
    ['archived', 'accepted', facts({ donePlans: 1 }), false],
    ['archived', 'quoting', facts(), true],
    ['declined', 'accepted', facts({ lastQuote: 'declined' }), true],
    ['expired', 'quoting', facts({ lastQuote: 'expired' }), true],
    ['deposit-paid', 'quoting', facts({ accepted: true, depositPaid: true }), false],
    ['quoting', 'deposit-paid', facts(), false],
    ['quoted', 'declined', facts({ quoted: true }), false],
  ] as [JobStatus, JobStatus, JobFacts, boolean][])('an estimator setting %s → %s: allowed %s', (from, to, f, allowed) => {
    const refused = refuseManualStatus('estimator', from, to, f);
    if (allowed) expect(refused).toBeNull();
    else expect(refused).toMatch(/by hand|restored/);
  });

  test('an estimator restores an archived job to what its plans say, and is told so otherwise', () => {
    expect(manualStatusChoices('estimator', 'archived', facts({ accepted: true }))).toEqual(['accepted', 'archived']);
    expect(refuseManualStatus('estimator', 'archived', 'cutting', facts({ accepted: true }))).toBe(
      'An archived job is restored to Accepted, what its plans say; only the owner can set another status by hand.',
    );
    expect(refuseManualStatus('estimator', 'accepted', 'cutting', facts({ accepted: true }))).toBe(
      'An accepted job cannot be set to Cutting by hand: cutting starts when a plan is released or a saw-order step is ticked. Only the owner can override that.',
    );
  });

  test('marking a job accepted records when, once; setting it back to quoting clears it; other statuses keep it', () => {
    const then = new Date('2026-11-02T15:00:00Z');
    const now = new Date('2026-12-01T09:00:00Z');
    expect(acceptedAtAfter('accepted', null, now)).toBe(now);
    expect(acceptedAtAfter('accepted', then, now)).toBe(then);
    expect(acceptedAtAfter('quoting', then, now)).toBeNull();
    expect(acceptedAtAfter('archived', then, now)).toBe(then);
    expect(acceptedAtAfter('done', null, now)).toBeNull();
    expect(acceptedAtAfter('declined', then, now)).toBeNull();
    expect(acceptedAtAfter('deposit-paid', then, now)).toBe(then);
  });
});
