/**
 * The one font of every PDF the app makes with @react-pdf/renderer (quotes, purchase orders, saw orders, part tags): IBM Plex Sans, the
 * face the app ships for the browser (app/fonts holds its WOFF2). The PDFs embed its WOFF files (fontkit reads WOFF
 * reliably; the WOFF2 subset fails to parse), copied from @fontsource/ibm-plex-sans into lib/quotes/fonts, so
 * fractions print as on screen (19¾″).
 */
import path from 'node:path';
import { Font } from '@react-pdf/renderer';

export const PDF_FONT_FAMILY = 'Plex Sans';
const FONT_DIR = path.join(process.cwd(), 'lib', 'quotes', 'fonts');
let registered = false;

export function registerPdfFonts(): void {
  if (registered) return;
  Font.register({
    family: PDF_FONT_FAMILY,
    fonts: [
      { src: path.join(FONT_DIR, 'ibm-plex-sans-latin-400-normal.woff'), fontWeight: 400 },
      { src: path.join(FONT_DIR, 'ibm-plex-sans-latin-600-normal.woff'), fontWeight: 600 },
    ],
  });
  // Words are never broken with hyphens nobody wrote.
  Font.registerHyphenationCallback((word) => [word]);
  registered = true;
}
