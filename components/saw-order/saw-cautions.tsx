import { SAW_CAUTIONS } from '@/lib/safety';

/** The usual saw cautions, deferring to the machine's manual, local codes and licensed practice. */
export function SawCautions({ compact = false, screenOnly = false }: { compact?: boolean; screenOnly?: boolean }) {
  return (
    <aside
      className={`mb-6 rounded-lg border border-amber/40 bg-amber-wash px-5 py-4 print:mb-3 print:break-inside-avoid print:border-graphite print:bg-white print:px-3 print:py-2 ${screenOnly ? 'print:hidden' : ''}`}
      aria-label="Saw safety"
    >
      <p className="mb-2 font-semibold text-graphite print:mb-1 print:text-xs">
        Before you cut — a saw order is a cutting plan, not a safety procedure
      </p>
      <ul className={`list-disc space-y-1 pl-5 text-graphite-soft print:space-y-0 print:text-[9px] ${compact ? 'text-xs' : 'text-sm'}`}>
        {SAW_CAUTIONS.map((c) => (
          <li key={c}>{c}</li>
        ))}
      </ul>
    </aside>
  );
}
