import { packWithLimits } from './pack-core';
import type { PackFn } from './types';

export { PackInputError } from './pack-input';
export type { PackLimits } from './pack-core';
export { packWithLimits } from './pack-core';

/**
 * Kerfwise's guillotine packing core. A deterministic constructive phase (item orders × placement and split rules,
 * bin by bin) gives the first plan; an improvement phase then re-packs the items of the emptiest bins until the
 * time budget, a lower bound or a cancel. The improvement phase runs on the clock, so under different load it may
 * stop at a different point (use `packWithLimits` with `maxIterations` for a fully repeatable run).
 */
export const packGuillotine: PackFn = (items, bins, options) => packWithLimits(items, bins, options);
