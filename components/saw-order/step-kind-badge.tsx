import type { SawStep } from '@/shared/schemas/nesting';

/** Rip and crosscut told apart by word, arrow and colour, so a glance at the printout is enough. */
export function StepKindBadge({ kind, trim, narrow, large = false }: { kind: SawStep['kind']; trim?: boolean; narrow?: boolean; large?: boolean }) {
  const size = large ? 'px-3 py-1 text-base' : 'px-2 py-0.5 text-xs';
  return (
    <span className="inline-flex flex-wrap items-center gap-1.5">
      <span
        className={`inline-flex items-center gap-1 rounded font-semibold uppercase tracking-wide ${size} ${
          kind === 'rip'
            ? 'bg-oak text-white print:border print:border-oak print:bg-white print:text-oak-deep'
            : 'bg-graphite text-paper print:border print:border-graphite print:bg-white print:text-graphite'
        }`}
      >
        <span aria-hidden>{kind === 'rip' ? '⟷' : '↕'}</span>
        {kind === 'rip' ? 'Rip' : 'Crosscut'}
      </span>
      {trim && <span className={`rounded border border-amber bg-amber-wash font-medium text-amber ${size}`}>Trim cut</span>}
      {narrow && <span className={`rounded border border-brick bg-brick-wash font-medium text-brick ${size}`}>Sled, track saw or band saw</span>}
    </span>
  );
}
