/**
 * Layouts from `maxrects-packer`, a general-purpose rectangle packer, used as an outside reference: the bound tests
 * check that no bound exceeds the bins of a real layout, and the benchmark compares bin counts with our packer.
 * Every layout is checked (inside its bin, no overlaps, every item placed) before anyone trusts its bin count.
 * Test and benchmark support only: nothing in the product imports this.
 */
import { MaxRectsPacker } from 'maxrects-packer/dist/maxrects-packer.mjs';
import { contains, overlaps, type Rect } from '@/lib/geometry/rect';

export interface ReferenceBin {
  /** Footprints in the bin (already turned where the packer turned an item); `id` is the item's index. */
  rects: (Rect & { id: number })[];
}

export function maxRectsLayout(items: readonly { w: number; h: number }[], bin: { w: number; h: number }, rotation: boolean): ReferenceBin[] {
  const packer = new MaxRectsPacker(bin.w, bin.h, 0, { smart: false, pot: false, square: false, allowRotation: rotation, border: 0 });
  // Plain objects (not its Rectangle class) keep their input width/height; `rot` says the footprint is turned.
  packer.addArray(items.map((it, id) => ({ width: it.w, height: it.h, id })) as never);
  const bins: ReferenceBin[] = packer.bins.map((b) => ({
    rects: b.rects.map((r) => {
      const id = (r as unknown as { id: number }).id;
      return r.rot ? { id, x: r.x, y: r.y, w: r.height, h: r.width } : { id, x: r.x, y: r.y, w: r.width, h: r.height };
    }),
  }));
  checkLayout(items, bin, bins);
  return bins;
}

function checkLayout(items: readonly { w: number; h: number }[], bin: { w: number; h: number }, bins: ReferenceBin[]): void {
  const seen = new Set<number>();
  const whole = { x: 0, y: 0, w: bin.w, h: bin.h };
  for (const [b, { rects }] of bins.entries()) {
    rects.forEach((r, i) => {
      const it = items[r.id];
      const sameSize = it && ((r.w === it.w && r.h === it.h) || (r.w === it.h && r.h === it.w));
      if (!sameSize || seen.has(r.id)) throw new Error(`maxrects-packer bin ${b}: item ${r.id} is not a placement of an input item`);
      if (!contains(whole, r)) throw new Error(`maxrects-packer bin ${b}: item ${r.id} sticks out of the bin`);
      for (const other of rects.slice(i + 1)) {
        if (overlaps(r, other)) throw new Error(`maxrects-packer bin ${b}: items ${r.id} and ${other.id} overlap`);
      }
      seen.add(r.id);
    });
  }
  if (seen.size !== items.length) throw new Error(`maxrects-packer placed ${seen.size} of ${items.length} items`);
}
