/**
 * Shrinkage coefficients per 1 % change of moisture content, USDA FPL Wood Handbook (FPL-GTR-190, 2010),
 * table 13-5 (check values in RULES.md): C_R across quartersawn width (radial), C_T across flatsawn width
 * (tangential). Only species whose handbook values were checked are listed; add others with their source.
 */
export const SPECIES = {
  'red-oak': { name: 'red oak', radial: 0.00158, tangential: 0.00369 },
  'white-oak': { name: 'white oak', radial: 0.0018, tangential: 0.00365 },
  'hard-maple': { name: 'hard maple', radial: 0.00165, tangential: 0.00353 },
  'black-cherry': { name: 'black cherry', radial: 0.00126, tangential: 0.00248 },
  'black-walnut': { name: 'black walnut', radial: 0.0019, tangential: 0.00274 },
} as const satisfies Record<string, { name: string; radial: number; tangential: number }>;

export type SpeciesId = keyof typeof SPECIES;
export const SPECIES_IDS = Object.keys(SPECIES) as [SpeciesId, ...SpeciesId[]];
