import { describe, expect, test } from 'vitest';
import { blankSawText, readSawForm, sawFacts, sawText } from './saw-form-values';

const IMPERIAL = { system: 'imperial', precision: 16, feet: false } as const;

describe('the saw form', () => {
  test('reads inches into mm: 30″ rip = 762 mm, ⅛″ kerf = 3.175 mm, 1″ = 25.4 mm (1 in = 25.4 mm exactly); blanks are no limit', () => {
    const read = readSawForm(
      { ...blankSawText(), name: 'Cabinet saw', kerf: '1/8', ripCapacity: '30', crosscutCapacity: '24', minFenceWidth: '1' },
      IMPERIAL,
    );
    expect(read).toEqual({
      ok: true,
      saw: expect.objectContaining({
        kerf: 3.175,
        ripCapacity: 762,
        crosscutCapacity: 609.6,
        maxPieceLength: null,
        maxPieceWidth: null,
        maxStages: 3,
        firstStage: 'rip',
        minFenceWidth: 25.4,
      }),
    });
    if (read.ok) expect(readSawForm(sawText(read.saw, IMPERIAL), IMPERIAL)).toEqual(read);
  });

  test('shows a 3/32″ track-saw kerf exactly, not rounded to the shop’s sixteenths (3/32″ = 2.38125 mm)', () => {
    const read = readSawForm(
      { ...blankSawText(), kind: 'track-saw', name: 'Track saw', kerf: '3/32', crosscutCapacity: '110', maxStages: 'any', minFenceWidth: '0' },
      IMPERIAL,
    );
    expect(read.ok).toBe(true);
    if (!read.ok) return;
    expect(read.saw.kerf).toBeCloseTo(2.38125, 9);
    const facts = Object.fromEntries(sawFacts(read.saw, IMPERIAL).map((f) => [f.label, f.value]));
    expect(facts.Kerf).toBe('3/32″');
    expect(facts['Track length']).toBe('110″');
    expect(facts['Rip capacity']).toBe('no fence');
  });

  test('says what is wrong per field: no name, a kerf that is not a length, the shop’s own kind with no name', () => {
    const read = readSawForm({ ...blankSawText(), kind: 'other', kerf: 'wide', minFenceWidth: '0' }, IMPERIAL);
    expect(read.ok).toBe(false);
    if (!read.ok) expect(Object.keys(read.errors).sort()).toEqual(['kerf', 'kindName', 'name']);
  });
});
