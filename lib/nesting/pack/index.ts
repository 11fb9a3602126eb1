import { packWithLimits } from './pack-core';
import type { PackFn } from './types';

export { PackInputError } from './pack-input';
export type { PackLimits } from './pack-core';
export { packWithLimits } from './pack-core';

/**
 * Kerfwise's guillotine packing core.
 *
 * 1. Constructive phase (deterministic, never on the clock): item orders × fill rules, bin by bin, as many
 *    combinations as the job size allows (all of them for small jobs, one for thousands of parts). Its best is the
 *    first plan, reported at once through `onProgress`.
 * 2. Improvement phase, until `timeBudgetMs` after the call began, a lower bound on the bins, or a cancel: the
 *    remaining combinations, then re-packing — with one bin type, bin elimination (`PoolSearch`); with several,
 *    re-packing the emptiest bins with a few others under the objective.
 *
 * Seeded: the same seed and the same amount of search give the same result. Phase 2 stops on the clock, so under
 * a different load it may stop at a different point; `packWithLimits(…, { maxIterations })` is fully repeatable.
 * It pauses for the event loop every ~25 ms, reports progress every ~150 ms and stops within one bin's work of a
 * cancel, returning the best plan so far.
 */
export const packGuillotine: PackFn = (items, bins, options) => packWithLimits(items, bins, options);
