/**
 * Reading a PDF back in tests with Debian's poppler-utils (pdfinfo, pdftotext, pdftoppm: a general-purpose reference
 * reader, installed by `npm test` as it installs chromium) and decoding its QR codes with jsQR. Only node built-ins
 * and those: the Playwright specs use it too.
 */
import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import jsQR from 'jsqr';

function withFile<T>(bytes: Uint8Array, read: (file: string) => T): T {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-pdf-read-'));
  const file = path.join(dir, 'doc.pdf');
  fs.writeFileSync(file, bytes);
  try {
    return read(file);
  } finally {
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

export interface PdfInfo {
  title: string;
  /** Each page's width and height in points (1/72 in, ISO 32000-1 user space). */
  pages: { width: number; height: number }[];
}

export function pdfInfo(bytes: Uint8Array): PdfInfo {
  const out = withFile(bytes, (f) => execFileSync('pdfinfo', ['-f', '1', '-l', '100000', f], { encoding: 'utf8' }));
  const pages = [...out.matchAll(/^Page\s+\d+ size:\s+([\d.]+) x ([\d.]+) pts/gm)].map((m) => ({ width: Number(m[1]), height: Number(m[2]) }));
  return { title: /^Title:\s+(.*)$/m.exec(out)?.[1] ?? '', pages };
}

/** The whole text as `pdftotext -layout` reads it. */
export const pdfLayoutText = (bytes: Uint8Array): string =>
  withFile(bytes, (f) => execFileSync('pdftotext', ['-layout', f, '-'], { encoding: 'utf8' }));

/** One line of text as poppler finds it: its words joined by spaces, its box in points from the page's top-left. */
export interface PdfLine {
  page: number;
  text: string;
  xMin: number;
  yMin: number;
  xMax: number;
  yMax: number;
}

const unescape = (s: string) =>
  s
    .replace(/&lt;/g, '<')
    .replace(/&gt;/g, '>')
    .replace(/&quot;/g, '"')
    .replace(/&#39;/g, "'")
    .replace(/&amp;/g, '&');

export function pdfLines(bytes: Uint8Array): PdfLine[] {
  const html = withFile(bytes, (f) => execFileSync('pdftotext', ['-bbox-layout', f, '-'], { encoding: 'utf8', maxBuffer: 256 * 1024 * 1024 }));
  const lines: PdfLine[] = [];
  html
    .split('<page ')
    .slice(1)
    .forEach((page, index) => {
      for (const m of page.matchAll(/<line xMin="([\d.]+)" yMin="([\d.]+)" xMax="([\d.]+)" yMax="([\d.]+)">([\s\S]*?)<\/line>/g)) {
        const words = [...m[5].matchAll(/<word [^>]*>([^<]*)<\/word>/g)].map((w) => unescape(w[1]));
        lines.push({ page: index, text: words.join(' '), xMin: Number(m[1]), yMin: Number(m[2]), xMax: Number(m[3]), yMax: Number(m[4]) });
      }
    });
  return lines;
}

/**
 * The QR code inside a box of a page (points from the top-left), rendered at `dpi` by pdftoppm and decoded by
 * jsQR; null when none decodes.
 */
export function decodeQr(bytes: Uint8Array, page: number, box: { x: number; y: number; w: number; h: number }, dpi = 300): string | null {
  const k = dpi / 72;
  const ppm = withFile(bytes, (f) =>
    execFileSync('pdftoppm', [
      '-r',
      String(dpi),
      '-f',
      String(page + 1),
      '-l',
      String(page + 1),
      '-x',
      String(Math.floor(box.x * k)),
      '-y',
      String(Math.floor(box.y * k)),
      '-W',
      String(Math.ceil(box.w * k)),
      '-H',
      String(Math.ceil(box.h * k)),
      '-singlefile',
      f,
    ]),
  );
  // Binary PPM (P6): "P6 <w> <h> <max>" then RGB bytes.
  const header = /^P6\s+(\d+)\s+(\d+)\s+(\d+)\s/.exec(ppm.subarray(0, 64).toString('latin1'));
  if (!header) throw new Error('pdftoppm did not write a PPM image.');
  const [w, h] = [Number(header[1]), Number(header[2])];
  const rgb = ppm.subarray(header[0].length);
  const rgba = new Uint8ClampedArray(w * h * 4);
  for (let i = 0; i < w * h; i++) {
    rgba[i * 4] = rgb[i * 3];
    rgba[i * 4 + 1] = rgb[i * 3 + 1];
    rgba[i * 4 + 2] = rgb[i * 3 + 2];
    rgba[i * 4 + 3] = 255;
  }
  return jsQR(rgba, w, h)?.data ?? null;
}
