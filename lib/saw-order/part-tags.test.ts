import { describe, expect, test } from 'vitest';
import { inches } from '@/lib/units/length';
import { partTagPath, partTags } from './part-tags';
import { carcassRequest, nest } from './test-plans';

describe('part tags', () => {
  test('one tag per placed part instance, sized along and across the grain whatever the rotation', async () => {
    const { request, plan } = await nest(carcassRequest());
    const tags = partTags(plan, request.parts);
    const placed = plan.pieces.reduce((n, p) => n + p.placements.length, 0);
    expect(tags).toHaveLength(placed);
    expect(new Set(tags.map((t) => `${t.partId}#${t.instance}`)).size).toBe(placed);
    for (const t of tags) {
      const part = request.parts.find((p) => p.id === t.partId)!;
      expect(t.length).toBeCloseTo(part.length, 9);
      expect(t.width).toBeCloseTo(part.width, 9);
      expect(t.grain).toBe(part.grain === 'along-length');
    }
    // The stretchers may turn (grain "any"), so they carry no grain arrow; sides are 34-1/2″ along the grain.
    expect(tags.find((t) => t.partId === 'side')!.length).toBeCloseTo(inches(34.5), 9);
    expect(tags.filter((t) => t.partId === 'stretcher').every((t) => !t.grain)).toBe(true);
  });

  test('a tag leads to its part’s page with the plan and instance', () => {
    expect(partTagPath('plan-1', { partId: 'p 1', instance: 3 })).toBe('/parts/p%201?plan=plan-1&instance=3');
  });
});
