import { describe, expect, test } from 'vitest';
import { describeMovement } from './describe-movement';

// A reservation holds pieces still on the rack; cutting them takes them off and ends the hold (common practice, no source).
describe('a stock ledger row in words', () => {
  test.each([
    ['a receipt of 3', { kind: 'received', quantity: 3, reservedChange: 0 }, 'Received', '+3', '—'],
    ['a release reserving one sheet', { kind: 'reserved', quantity: 0, reservedChange: 1 }, 'Reserved', '—', '+1'],
    ['a cancel giving two back', { kind: 'released', quantity: 0, reservedChange: -2 }, 'Reservation given back', '—', '−2'],
    ['one reserved sheet cut at done', { kind: 'consumed', quantity: -1, reservedChange: -1 }, 'Cut (was reserved)', '−1', '−1'],
    ['a bought sheet cut on arrival', { kind: 'consumed', quantity: -1, reservedChange: 0 }, 'Cut', '−1', '—'],
    ['an offcut put on the rack', { kind: 'offcut-created', quantity: 1, reservedChange: 0 }, 'Offcut racked', '+1', '—'],
    ['a count two short', { kind: 'adjusted', quantity: -2, reservedChange: 0 }, 'Count adjusted', '−2', '—'],
  ] as const)('%s', (_label, m, what, onHand, reserved) => {
    expect(describeMovement(m)).toMatchObject({ what, onHand, reserved });
  });

  test('one sheet cut from its reservation reads as one sheet, not two', () => {
    const words = describeMovement({ kind: 'consumed', quantity: -1, reservedChange: -1 });
    expect(words.meaning).toBe('1 piece cut for the plan that reserved it: off the rack, and the reservation ends.');
  });
});
