import { movementWarning } from '@/lib/lumber/wood-movement';
import { SPECIES, SPECIES_IDS, type SpeciesId } from '@/lib/lumber/species';
import type { ShopUnits } from '@/shared/schemas/units';
import type { DrawerSchedule } from '@/shared/schemas/drawer-schedule';
import type { SawnCut } from '@/shared/schemas/lumber';

/**
 * Seasonal swing of indoor moisture content a drawer bottom lives through, percent (common practice, no source:
 * heated winters near 6 %, humid summers near 12 %).
 */
export const INDOOR_MC = { from: 6, to: 12 } as const;

const lastWord = (id: SpeciesId) => SPECIES[id].name.split(' ').at(-1)!;
/** "Cherry" or "walnut" alone names one species in the table; "oak" does not. */
const UNIQUE_LAST_WORD = new Set(SPECIES_IDS.filter((id) => SPECIES_IDS.filter((o) => lastWord(o) === lastWord(id)).length === 1));

const SHEET_WORDS = /ply|mdf|particle|hardboard|veneer|melamine|board stock|osb/i;

/** A solid-wood species named in a material ("White oak", "quartersawn white oak"), or null for sheet goods. */
export function speciesOf(material: string): { species: SpeciesId; cut: SawnCut } | null {
  if (SHEET_WORDS.test(material)) return null;
  const lower = material.toLowerCase();
  const species =
    SPECIES_IDS.find((id) => lower.includes(SPECIES[id].name)) ??
    SPECIES_IDS.find((id) => UNIQUE_LAST_WORD.has(id) && new RegExp(`\\b${lastWord(id)}\\b`).test(lower));
  if (!species) return null;
  return { species, cut: /quarter/.test(lower) ? 'quartersawn' : /\brift/.test(lower) ? 'riftsawn' : 'flatsawn' };
}

/**
 * A warning when a solid-wood bottom will move across its grain more than it can: an applied bottom is fixed, a
 * grooved one has only its clearance to move in. The bottom's grain runs side to side, so it moves front to back
 * across its width (the part's width).
 */
export function bottomMovementWarning(schedule: DrawerSchedule, bottomWidth: number, units: ShopUnits): string | null {
  const solid = speciesOf(schedule.bottom.material);
  if (!solid) return null;
  const play = schedule.bottom.mount === 'groove' ? schedule.bottom.groove.clearance : 0;
  return movementWarning(
    {
      species: solid.species,
      cut: solid.cut,
      width: bottomWidth,
      mcFrom: INDOOR_MC.from,
      mcTo: INDOOR_MC.to,
      fixedAcrossWidth: true,
      ...(play > 0 ? { threshold: play } : {}),
    },
    units,
  );
}
