import { describe, expect, test } from 'vitest';
import { DomainError } from '@/lib/errors';
import type { NestRequestInput } from '@/shared/schemas/nesting';
import { nestSawSchema } from '@/shared/schemas/saw';
import { requestForChoice } from './request-for-choice';

const offered: NestRequestInput = {
  parts: [{ id: 'side', label: 'Base side', quantity: 2, length: 876, width: 584, thickness: 18, material: 'Birch ply', grain: 'along-length' }],
  stock: [
    {
      id: 'stock:a',
      kind: 'sheet',
      length: 2440,
      width: 1220,
      thickness: 18,
      material: 'Birch ply',
      grain: 'along-length',
      count: 4,
      costEach: 9400,
    },
    {
      id: 'offcut:b',
      kind: 'offcut',
      length: 900,
      width: 600,
      thickness: 18,
      material: 'Birch ply',
      grain: 'along-length',
      count: 1,
      costEach: 1200,
    },
  ],
  settings: { kerf: 3.2, trim: 10 },
};
// A full-kerf table-saw blade is 1/8″ (3.2 mm) and a track saw's about 2.2 mm (common practice, no source).
const tableSaw = nestSawSchema.parse({
  kind: 'table-saw',
  name: 'Cabinet saw',
  kerf: 4,
  ripCapacity: 762,
  crosscutCapacity: 610,
  maxStages: 3,
  firstStage: 'rip',
  minFenceWidth: 25.4,
});
const trackSaw = nestSawSchema.parse({
  kind: 'track-saw',
  name: 'Track saw',
  kerf: 2.2,
  ripCapacity: null,
  crosscutCapacity: 2800,
  minFenceWidth: 0,
});

describe('the request a Nest choice makes', () => {
  test('the chosen stock only, the settings as changed, the parts as offered', () => {
    const request = requestForChoice(offered, { stockIds: ['offcut:b'], settings: { preferOffcuts: true } });
    expect(request.stock.map((s) => s.id)).toEqual(['offcut:b']);
    expect(request.settings).toEqual({ kerf: 3.2, trim: 10, preferOffcuts: true });
    expect(request.parts).toBe(offered.parts);
  });

  test('each cut is allowed the widest kerf of the settings and the saws (a 4 mm blade beats the 3.2 mm setting)', () => {
    const request = requestForChoice(offered, { stockIds: ['stock:a'], saw: tableSaw, breakdownSaw: trackSaw });
    expect(request.settings?.kerf).toBe(4);
    expect(request.settings?.saw?.name).toBe('Cabinet saw');
    expect(request.settings?.breakdownSaw?.name).toBe('Track saw');
    // A thinner blade never narrows the kerf the shop set.
    expect(requestForChoice(offered, { stockIds: ['stock:a'], saw: trackSaw }).settings?.kerf).toBe(3.2);
  });

  test('stock no longer on offer, or a breakdown saw without a saw for the rest, is refused with the field named', () => {
    const gone = () => requestForChoice(offered, { stockIds: ['stock:a', 'stock:sold'] });
    expect(gone).toThrow(DomainError);
    expect(gone).toThrow(expect.objectContaining({ kind: 'invalid', fields: { stockIds: ['"stock:sold" is not on offer'] } }));
    expect(() => requestForChoice(offered, { stockIds: ['stock:a'], breakdownSaw: trackSaw })).toThrow(
      expect.objectContaining({ kind: 'invalid', fields: { breakdownSawId: ['choose the second saw too'] } }),
    );
  });
});
