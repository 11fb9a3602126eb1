import localFont from 'next/font/local';

// IBM Plex (SIL Open Font License, see app/fonts/LICENSE-IBM-Plex.txt), shipped in the repo: nothing is fetched.
export const plexSans = localFont({
  src: [
    { path: './fonts/ibm-plex-sans-latin-400-normal.woff2', weight: '400', style: 'normal' },
    { path: './fonts/ibm-plex-sans-latin-500-normal.woff2', weight: '500', style: 'normal' },
    { path: './fonts/ibm-plex-sans-latin-600-normal.woff2', weight: '600', style: 'normal' },
    { path: './fonts/ibm-plex-sans-latin-700-normal.woff2', weight: '700', style: 'normal' },
  ],
  variable: '--font-plex-sans',
  display: 'swap',
});

export const plexMono = localFont({
  src: [
    { path: './fonts/ibm-plex-mono-latin-400-normal.woff2', weight: '400', style: 'normal' },
    { path: './fonts/ibm-plex-mono-latin-500-normal.woff2', weight: '500', style: 'normal' },
  ],
  variable: '--font-plex-mono',
  display: 'swap',
});

// The same faces' symbols (≈, ⅛ ⅜ ⅝ ⅞, superscript and subscript digits, arrows, ✓), which the Latin files lack: next in
// each stack, so a length like ³⁄₁₆″ or ≈302 mm is drawn in Plex rather than in whatever the device falls back to.
export const plexSansSymbols = localFont({
  src: [
    { path: './fonts/ibm-plex-sans-pi-400-normal.woff2', weight: '400', style: 'normal' },
    { path: './fonts/ibm-plex-sans-pi-500-normal.woff2', weight: '500', style: 'normal' },
    { path: './fonts/ibm-plex-sans-pi-600-normal.woff2', weight: '600', style: 'normal' },
    { path: './fonts/ibm-plex-sans-pi-700-normal.woff2', weight: '700', style: 'normal' },
  ],
  variable: '--font-plex-sans-symbols',
  display: 'swap',
  adjustFontFallback: false,
});

export const plexMonoSymbols = localFont({
  src: [
    { path: './fonts/ibm-plex-mono-pi-400-normal.woff2', weight: '400', style: 'normal' },
    { path: './fonts/ibm-plex-mono-pi-500-normal.woff2', weight: '500', style: 'normal' },
  ],
  variable: '--font-plex-mono-symbols',
  display: 'swap',
  adjustFontFallback: false,
});
