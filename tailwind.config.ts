import type { Config } from 'tailwindcss';

/**
 * Kerfwise's palette: paper and graphite for calm, dense screens; one wood tone (honey oak) as the accent.
 * Loaded from app/globals.css with `@config`; part colours for drawer schedules and materials live in
 * lib/ui/part-colors.ts so the canvas can use them too. Every colour used for text reads at 4.5 : 1 or more on paper,
 * deep paper and the washes (WCAG 2.1 AA for normal text; the accessibility spec checks every page with axe-core).
 */
export default {
  content: ['./app/**/*.{ts,tsx}', './components/**/*.{ts,tsx}'],
  theme: {
    extend: {
      colors: {
        paper: { DEFAULT: '#faf7f1', deep: '#f1ece2', edge: '#e3dccd' },
        graphite: { DEFAULT: '#2a2a2d', soft: '#4a4a50', mute: '#69686e', faint: '#a9a7ab' },
        oak: { DEFAULT: '#935d26', deep: '#7f4d1c', light: '#e9cfa8', wash: '#f6ead8' },
        sage: { DEFAULT: '#4a7254', wash: '#e3efe4' },
        brick: { DEFAULT: '#a8432f', wash: '#f7e2dc' },
        amber: { DEFAULT: '#85601f', wash: '#f8edd3' },
      },
      fontFamily: {
        sans: ['var(--font-plex-sans)', 'var(--font-plex-sans-symbols)', 'system-ui', 'sans-serif'],
        mono: ['var(--font-plex-mono)', 'var(--font-plex-mono-symbols)', 'ui-monospace', 'monospace'],
      },
    },
  },
} satisfies Config;
