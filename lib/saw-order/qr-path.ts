/**
 * A QR code as one SVG path (a unit square per dark module, with the 4-module quiet zone the standard asks for).
 * Drawn as React elements rather than injected markup; the symbol itself comes from the `qrcode` package.
 */
import QRCode from 'qrcode';

export const QUIET_ZONE = 4;

export interface QrPath {
  /** Modules per side, quiet zone included: the SVG viewBox is `0 0 size size`. */
  size: number;
  d: string;
}

export function qrPath(text: string): QrPath {
  const { modules } = QRCode.create(text, { errorCorrectionLevel: 'M' });
  const n = modules.size;
  let d = '';
  for (let row = 0; row < n; row++) {
    for (let col = 0; col < n; col++) {
      // Runs of dark modules in a row become one rectangle, which keeps the path short.
      if (!modules.get(row, col)) continue;
      let run = 1;
      while (col + run < n && modules.get(row, col + run)) run++;
      d += `M${col + QUIET_ZONE} ${row + QUIET_ZONE}h${run}v1h${-run}z`;
      col += run - 1;
    }
  }
  return { size: n + 2 * QUIET_ZONE, d };
}
