/**
 * Part labels that stay legible at any zoom: drawn at a fixed screen size, shortened to the name, or hidden
 * when the part is too small on screen to hold them.
 */
export const LABEL_FONT_PX = 12;

export type LabelFit = { lines: string[]; fontPx: number } | null;

/** Rough width of a line at `fontPx` (the sans face runs about 0.56 em per character). */
const textWidth = (text: string, fontPx: number) => text.length * fontPx * 0.56;

/** What fits on a part that measures `screenW` × `screenH` px: name and size, the name alone, or nothing. */
export function fitLabel(name: string, size: string, screenW: number, screenH: number, fontPx = LABEL_FONT_PX): LabelFit {
  const pad = 4;
  const room = screenW - 2 * pad;
  const line = fontPx * 1.2;
  if (screenH >= 2 * line + pad && room >= Math.max(textWidth(name, fontPx), textWidth(size, fontPx))) return { lines: [name, size], fontPx };
  if (screenH >= line + pad && room >= textWidth(name, fontPx)) return { lines: [name], fontPx };
  const small = Math.max(8, Math.floor(fontPx * 0.8));
  const short = name.length > 8 ? `${name.slice(0, 7)}…` : name;
  if (screenH >= small * 1.2 + 2 && room >= textWidth(short, small)) return { lines: [short], fontPx: small };
  return null;
}
