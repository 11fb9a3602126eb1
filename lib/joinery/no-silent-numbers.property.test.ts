import fc from 'fast-check';
import { describe, expect, test } from 'vitest';
import { expectSane, expectSaneOrRefused } from '@/tests/support/sane';
import { inches } from '@/lib/units/length';
import { boxFromOpening } from './box-from-opening';
import { lockRabbetFaceLeft, lockRabbetFenceSetback, MAX_SCHEDULE_LENGTH_MM } from './defaults';
import { jointCorners } from './joint-rules';
import { maxRouterSpeedRpm } from './router-safety';
import { defaultSetupCard, findSetupCard, lockRabbetCard, requiredSetupCards } from './setup-cards';
import { sizeDrawerSchedule } from './size-drawer-schedule';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';

const SEED = 20261202;
const anyNumber = fc.oneof(
  fc.double(),
  fc.integer({ min: -5000, max: 5000 }),
  fc.constantFrom(Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY, -1, 0, 1e6, 1e308, 5e-324),
);

/** An invented maker-style model (outside width = opening − 10 mm), so model schedules are in the mix. */
const MODEL = {
  kind: 'undermount',
  name: 'Tessel T-16',
  lengths: [250, 300, 400, 500],
  widthRule: 'outside',
  widthDeduction: 10,
  maxSideThickness: 16,
  bottomRecess: 13,
  heightClearance: 20,
  rearClearance: 10,
};

/** Schedules of every shape the form makes, each valid as written. */
const TEMPLATES = [
  {
    label: 'Metric bank',
    quantity: 3,
    size: { from: 'opening', width: 564, height: 180, depth: 540 },
    slide: { type: 'side-mount', series: 'metric' },
    thickness: { front: 18, side: 12 },
    front: { style: 'lipped', fit: 'reveal', reveal: 1.5 },
  },
  {
    label: 'Model bank',
    quantity: 2,
    size: { from: 'opening', width: 564, height: 180, depth: 540 },
    slide: { type: 'undermount', model: MODEL },
    thickness: { front: 16, side: 16 },
    front: { style: 'applied', fit: 'inset', reveal: 1.5 },
  },
  {
    label: 'Inch bank',
    quantity: 1,
    size: { from: 'opening', width: inches(15), height: inches(7), depth: inches(22) },
    thickness: { front: inches(3 / 4), side: inches(1 / 2) },
    front: { style: 'lipped' },
    joint: { method: 'half-blind-dovetail', lap: inches(3 / 16) },
  },
  {
    label: 'Box size',
    quantity: 4,
    size: { from: 'box', width: 400, height: 150, depth: 500 },
    joint: { method: 'rabbet-and-dado' },
    bottom: { mount: 'applied', thickness: 6 },
  },
];
/** Every number in a template, by its path. */
const numericPaths = (value: unknown, path: string[] = []): string[][] =>
  typeof value === 'number'
    ? [path]
    : value && typeof value === 'object'
      ? Object.entries(value).flatMap(([k, v]) => numericPaths(v, [...path, k]))
      : [];
const withValue = (template: object, path: string[], value: unknown) => {
  const copy = structuredClone(template) as Record<string, unknown>;
  let node = copy;
  for (const key of path.slice(0, -1)) node = node[key] as Record<string, unknown>;
  node[path[path.length - 1]] = value;
  return copy;
};
const brokenSchedule = fc
  .constantFrom(...TEMPLATES)
  .chain((t) => fc.tuple(fc.constant(t), fc.array(fc.tuple(fc.constantFrom(...numericPaths(t)), anyNumber), { minLength: 1, maxLength: 3 })))
  .map(([t, changes]) => changes.reduce<object>((s, [path, value]) => withValue(s, path, value), t));

describe('no public function of lib/joinery returns a silent wrong number (seeded properties)', () => {
  test('sizeDrawerSchedule: any schedule with any number anywhere gives finite parts under 3 m, or field errors that print no NaN', () => {
    fc.assert(
      fc.property(fc.oneof(brokenSchedule, fc.anything()), (input) => {
        const result = sizeDrawerSchedule(input);
        expectSane(result);
        if (result.ok) {
          for (const p of result.parts) {
            for (const n of [p.length, p.width, p.thickness]) expect(n > 0 && n <= MAX_SCHEDULE_LENGTH_MM + 200).toBe(true);
            expect(p.jointAllowance).toBeGreaterThanOrEqual(0);
          }
        } else {
          expect(result.errors.length).toBeGreaterThan(0);
          for (const e of result.errors) expect(e.message.length).toBeGreaterThan(10);
        }
      }),
      { seed: SEED, numRuns: 1500 },
    );
  });

  test('boxFromOpening, called on its own with any number: a finite box or field errors', () => {
    fc.assert(
      fc.property(fc.constantFrom(...TEMPLATES), anyNumber, anyNumber, (t, w, d) => {
        const s = drawerScheduleSchema.parse(t);
        const result = boxFromOpening({ ...s, size: { ...s.size, width: w, depth: d } as never });
        expectSane(result);
        if (result.ok) for (const n of Object.values(result.box)) expect(n).toBeGreaterThan(0);
      }),
      { seed: SEED, numRuns: 500 },
    );
  });

  test('the rules and setup cards: finite values or a RangeError, for any thickness', () => {
    fc.assert(
      fc.property(anyNumber, anyNumber, anyNumber, (a, b, c) => {
        expectSaneOrRefused(
          () => lockRabbetFaceLeft(a),
          (v) => expect(v).toBeGreaterThan(0),
        );
        expectSaneOrRefused(
          () => lockRabbetFenceSetback(a),
          (v) => expect(v).toBeGreaterThan(0),
        );
        expectSaneOrRefused(() => lockRabbetCard(a));
        expectSaneOrRefused(() => defaultSetupCard({ joint: 'lock-rabbet', stockThickness: a }));
        expectSaneOrRefused(() => findSetupCard([], { joint: 'lock-rabbet', stockThickness: a }));
        expectSaneOrRefused(
          () => maxRouterSpeedRpm(a),
          (rpm) => expect(rpm === null || rpm >= 12_000).toBe(true),
        );
        expectSaneOrRefused(() => requiredSetupCards({ joint: { method: 'box-joint', fingerWidth: 6 }, thickness: { front: a, back: b, side: c } }));
        expectSaneOrRefused(() => jointCorners({ method: 'lock-rabbet', faceLeft: c }, { front: a, back: b, side: 12 }));
      }),
      { seed: SEED, numRuns: 1000 },
    );
  });
});

describe('refusals named in the issue, each on its field', () => {
  test.each([
    ['a drawer box over 3 m', { size: { from: 'box', width: 3500, height: 150, depth: 500 } }, 'size.width', /over 3 m looks like a slipped unit/],
    [
      'a lip of a kilometre',
      { size: { from: 'box', width: 400, height: 150, depth: 500 }, front: { style: 'lipped', fit: 'lip', lip: 1_000_000 } },
      'front.lip',
      /over 100 mm looks like a slipped unit/,
    ],
    ['an infinite opening', { size: { from: 'opening', width: Number.POSITIVE_INFINITY, height: 150, depth: 500 } }, 'size.width', /Opening width/],
    [
      'a NaN side thickness',
      { size: { from: 'box', width: 400, height: 150, depth: 500 }, thickness: { side: Number.NaN } },
      'thickness.side',
      /Side thickness/,
    ],
    [
      'a negative reveal',
      { size: { from: 'opening', width: 400, height: 150, depth: 500 }, front: { style: 'lipped', fit: 'reveal', reveal: -1 } },
      'front.reveal',
      /cannot be negative/,
    ],
    [
      'a lock-rabbet front too thin for the starting rule',
      { size: { from: 'box', width: 400, height: 150, depth: 500 }, thickness: { front: 6, side: 6 } },
      'joint.faceLeft',
      /too thin for a lock rabbet/,
    ],
  ])('%s', (_label, over, path, message) => {
    const result = sizeDrawerSchedule({ label: 'Refused', quantity: 1, ...over });
    expect(result.ok).toBe(false);
    if (result.ok) return;
    expect(result.errors.find((e) => e.path === path)?.message).toMatch(message);
  });

  test('a NaN reaching a rule directly is refused, never carried into a card', () => {
    expect(() => lockRabbetCard(Number.NaN)).toThrow(RangeError);
    expect(() => defaultSetupCard({ joint: 'lock-rabbet', stockThickness: Number.NaN })).toThrow(RangeError);
    expect(() => maxRouterSpeedRpm(Number.NaN)).toThrow(RangeError);
  });
});
