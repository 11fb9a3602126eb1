import { typesetNominal } from '@/lib/cut-list/stock-match';
import { formatLength } from '@/lib/units/format-length';
import type { ShopUnits } from '@/shared/schemas/units';

/**
 * Quarters and halves as their Latin-1 glyphs (19-3/4″ → 19¾″, 3/4″ → ¾″), which the app's font and the PDF's
 * embedded subset both carry; other fractions stay as written (19-5/16″), since the subsets lack ⅛ and ⁵⁄₁₆.
 */
const GLYPHS: Record<string, string> = { '1/4': '¼', '1/2': '½', '3/4': '¾' };
export function quarterGlyphs(text: string): string {
  return text.replace(/(\d+)?-?\b(1\/4|1\/2|3\/4)(?=″|"| |$)/g, (_m, whole: string | undefined, f: string) => `${whole ?? ''}${GLYPHS[f]}`);
}

/** A stock size's length on a quote: the shop's unit, no ≈ (a size, not a cut), quarters as glyphs. */
export function quoteLength(mm: number, units: ShopUnits): string {
  return quarterGlyphs(formatLength(mm, units, { style: 'hyphen' }).replace(/^≈/, ''));
}

/** A nominal thickness as the stock room writes it ('3/4"', '5/4', '18 mm'), typeset: ¾″, 5/4, 18 mm. */
export const quoteNominal = (nominal: string) => quarterGlyphs(typesetNominal(nominal));
