import { invalid } from '@/lib/errors';
import type { NestRequestInput, NestSettings } from '@/shared/schemas/nesting';
import type { NestSaw } from '@/shared/schemas/saw';

/** What the person chose on the Nest screen, beside what was offered. */
export interface NestChoice {
  /** Ids of the offered stock to nest on; every one must be on offer. */
  stockIds: readonly string[];
  /** Settings changed from the shop's (kerf, budget, offcuts first…). */
  settings?: Partial<NestSettings>;
  /** The saw the parts are cut on, and the one that breaks sheets down first, as the shop's settings keep them. */
  saw?: NestSaw;
  breakdownSaw?: NestSaw;
}

/**
 * The one rule for turning an offer and a choice into the request the engine runs, used by the Nest screen (which
 * runs it in the worker) and by the server (which judges the saved plan against it): the chosen stock only, the
 * settings as changed, the saws' whole profiles (a saved plan keeps them), and each cut allowed the widest kerf of
 * the settings and the saws chosen.
 */
export function requestForChoice(offered: NestRequestInput, choice: NestChoice): NestRequestInput {
  const onOffer = new Set(offered.stock.map((s) => s.id));
  const gone = choice.stockIds.filter((id) => !onOffer.has(id));
  if (gone.length)
    throw invalid('Some of the chosen stock is no longer on offer; nest again.', { stockIds: gone.map((id) => `"${id}" is not on offer`) });
  if (choice.breakdownSaw && !choice.saw)
    throw invalid('A breakdown saw needs a second saw for the rest of the cuts.', { breakdownSawId: ['choose the second saw too'] });
  const chosen = new Set(choice.stockIds);
  const settings = { ...offered.settings, ...choice.settings };
  const sawKerf = Math.max(0, ...[choice.saw, choice.breakdownSaw].map((s) => s?.kerf ?? 0));
  return {
    parts: offered.parts,
    stock: offered.stock.filter((s) => chosen.has(s.id)),
    settings: {
      ...settings,
      ...(choice.saw ? { saw: choice.saw, kerf: Math.max(settings.kerf ?? 0, sawKerf) } : {}),
      ...(choice.breakdownSaw ? { breakdownSaw: choice.breakdownSaw } : {}),
    },
  };
}
