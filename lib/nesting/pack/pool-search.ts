import type { OrderKey } from './construct';
import { packPool, sortedOrder } from './construct';
import type { BinFiller } from './filler';
import { EPS } from './filler';
import type { Rng } from './prng';
import { randInt } from './prng';
import type { Bin, Problem, Solution } from './solution';

/**
 * Bin-elimination search for one bin type: the emptiest bin is dissolved into a pool of homeless parts, and each
 * step re-packs one or two bins together with the pool, keeping the change when the pool's area does not grow.
 * Moves that leave it equal are kept too: they wander across the plateau, which is where the way out usually
 * lies. When the pool empties, the job fits one bin fewer, and the next emptiest bin is dissolved.
 */
const EMPTIER_SHARE = 0.7;

export class PoolSearch {
  private bins: Bin[];
  private pool: number[] = [];
  private poolArea = 0;

  constructor(
    private readonly p: Problem,
    start: Solution,
    private readonly orderKeys: readonly OrderKey[],
  ) {
    this.bins = start.bins.slice();
    this.dissolveEmptiest();
  }

  /** One move; returns a complete solution with fewer bins when the pool has just emptied. */
  step(f: BinFiller, rng: Rng, attempts: number, scratch: Int32Array, mark: Uint8Array): Solution | null {
    const p = this.p;
    const nb = this.bins.length;
    if (nb === 0) return null;
    const k = Math.min(nb, 1 + randInt(rng, 3));
    // Mostly bins drawn towards the emptiest: they have room for the pool's parts.
    const ranked = rng() < EMPTIER_SHARE ? this.bins.map((_, j) => j).sort((x, y) => this.bins[x].used - this.bins[y].used || x - y) : null;
    const chosen = new Set<number>();
    while (chosen.size < k) chosen.add(ranked ? ranked[Math.floor(rng() ** 2 * nb)] : randInt(rng, nb));
    const items = this.pool.slice();
    for (const j of chosen) for (const i of this.bins[j].seq) items.push(i);
    const keys = this.orderKeys;
    const key = rng() < 0.6 ? keys[0] : keys[randInt(rng, keys.length)];
    const packing = packPool(p, f, sortedOrder(p, items, key), [k], randInt(rng, p.filler.rules), rng, attempts, scratch, mark);
    let area = 0;
    for (const i of packing.left) area += p.area[i];
    if (area > this.poolArea + EPS) return null;
    const kept = this.bins.filter((_, j) => !chosen.has(j));
    this.bins = kept.concat(packing.bins);
    this.pool = packing.left;
    this.poolArea = area;
    if (this.pool.length > 0) return null;
    const done: Solution = { bins: this.bins.slice(), noStock: [] };
    this.dissolveEmptiest();
    return done;
  }

  private dissolveEmptiest() {
    if (this.bins.length === 0) return;
    let e = 0;
    for (let j = 1; j < this.bins.length; j++) if (this.bins[j].used < this.bins[e].used) e = j;
    this.pool = Array.from(this.bins[e].seq);
    this.poolArea = this.bins[e].used;
    this.bins.splice(e, 1);
  }
}
