const TONES = {
  neutral: 'bg-paper-deep text-graphite-soft',
  accent: 'bg-oak-wash text-oak-deep',
  good: 'bg-sage-wash text-sage',
  warn: 'bg-amber-wash text-amber',
  bad: 'bg-brick-wash text-brick',
} as const;

export type Tone = keyof typeof TONES;

export function StatusBadge({ tone, children }: { tone: Tone; children: React.ReactNode }) {
  return <span className={`inline-block rounded-full px-2 py-0.5 text-xs font-medium ${TONES[tone]}`}>{children}</span>;
}
