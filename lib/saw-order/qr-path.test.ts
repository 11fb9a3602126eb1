import QRCode from 'qrcode';
import { describe, expect, test } from 'vitest';
import { QUIET_ZONE, qrPath } from './qr-path';

/** Dark modules the path paints, by replaying its `M x y h n` runs. */
function paintedModules(d: string): Set<string> {
  const cells = new Set<string>();
  for (const m of d.matchAll(/M(\d+) (\d+)h(\d+)v1h-\d+z/g)) {
    const [x, y, run] = [Number(m[1]), Number(m[2]), Number(m[3])];
    for (let k = 0; k < run; k++) cells.add(`${x + k - QUIET_ZONE},${y - QUIET_ZONE}`);
  }
  return cells;
}

describe('QR codes for part tags', () => {
  test.each([
    ['a short part link', 'https://kerfwise.example/parts/abc?plan=1&instance=2'],
    [
      'a long part link with uuids',
      'http://localhost:3000/parts/fc720cab-c126-4993-8e96-59ff81d0d82b?plan=58575a7f-ff10-4c30-a7b1-a5948bb8418b&instance=12',
    ],
  ])('%s paints exactly the dark modules the qrcode package encodes, inside a 4-module quiet zone (ISO/IEC 18004)', (_label, url) => {
    const { modules } = QRCode.create(url, { errorCorrectionLevel: 'M' });
    const { size, d } = qrPath(url);
    expect(size).toBe(modules.size + 2 * QUIET_ZONE);
    const expected = new Set<string>();
    for (let r = 0; r < modules.size; r++) for (let c = 0; c < modules.size; c++) if (modules.get(r, c)) expected.add(`${c},${r}`);
    expect(paintedModules(d)).toEqual(expected);
  });
});
