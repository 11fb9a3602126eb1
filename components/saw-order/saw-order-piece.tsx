import { SAW_CAUTIONS } from '@/lib/safety';
import { NARROW_HOW } from '@/lib/saw-order/describe-step';
import type { PieceView } from '@/lib/saw-order/piece-views';
import { StepDiagram } from './step-diagram';
import { StepKindBadge } from './step-kind-badge';

/** One stock piece's saw order: numbered cuts, each with its diagram, fence setting and what it frees. One printed page. */
export function SawOrderPiece({ view, first }: { view: PieceView; first: boolean }) {
  return (
    <section
      id={`piece-${view.name}`}
      aria-labelledby={`piece-${view.name}-title`}
      className={`mb-10 print:mb-0 ${first ? '' : 'print:break-before-page'}`}
      data-testid="saw-order-piece"
    >
      <header className="mb-3 flex flex-wrap items-baseline justify-between gap-2 border-b-2 border-graphite pb-2 print:mb-1 print:pb-1">
        <h2 id={`piece-${view.name}-title`} className="text-2xl print:text-lg">
          {view.heading}
        </h2>
        <p className="text-sm text-graphite-soft">
          {view.detail} · {view.steps.length} cut{view.steps.length === 1 ? '' : 's'}
          {sawsUsed(view).length > 0 && <> · on {sawsUsed(view).join(', then ')}</>}
        </p>
      </header>
      {view.steps.length === 0 ? (
        <p className="card px-4 py-6 text-sm text-graphite-mute">
          No saw order for this piece yet: it is rebuilt when the plan is saved on the Layout bench.
        </p>
      ) : (
        <ol className="grid gap-3 sm:grid-cols-2 xl:grid-cols-3 print:grid-cols-5 print:gap-1" aria-label={`Cuts on ${view.heading}`}>
          {view.steps.map(({ text, geometry }) => (
            <li
              key={text.n}
              className="card flex flex-col gap-2 p-3 print:break-inside-avoid print:gap-1 print:rounded-none print:p-1.5"
              data-testid="saw-step"
            >
              <div className="flex items-start justify-between gap-2">
                <span className="font-mono text-3xl font-semibold leading-none print:text-base" aria-label={`Cut ${text.n}`}>
                  {text.n}
                </span>
                <StepKindBadge kind={text.kind} trim={text.trim} narrow={text.narrow} />
              </div>
              {text.saw && (
                <p className="text-sm font-semibold text-graphite print:text-[8px]" data-testid="step-saw">
                  <span className="font-normal text-graphite-mute">Saw:</span> {text.saw}
                </p>
              )}
              <StepDiagram geometry={geometry} stock={view.stock} parts={view.parts} className="h-auto w-full" />
              <div className="print:flex print:flex-wrap print:items-baseline print:gap-x-1 print:leading-none">
                <div className="text-xs text-graphite-mute print:text-[8px]">
                  Piece <span className="font-semibold text-graphite">{text.piece}</span> · fence
                </div>
                <div className="font-mono text-2xl font-semibold leading-tight print:text-sm print:leading-none" data-testid="fence">
                  {text.fence}
                </div>
                <div className="text-xs text-graphite-mute print:text-[8px]">cut length {text.length}</div>
                {text.narrow && (
                  <p className="mt-1 text-xs font-medium text-brick print:text-[8px]" role="note">
                    Cut it {NARROW_HOW}.
                  </p>
                )}
              </div>
              <ProducedList text={text} />
            </li>
          ))}
        </ol>
      )}
      {/* The cautions on every printed page (the box above the first piece is for the screen). */}
      <p className="mt-2 hidden text-[8px] leading-snug text-graphite-soft print:block">
        <strong className="text-graphite">Saw safety:</strong> {SAW_CAUTIONS.join(' ')}
      </p>
    </section>
  );
}

/** The saws the piece's cuts are made on, in the order they first come up. */
const sawsUsed = (view: PieceView) => [...new Set(view.steps.flatMap((s) => (s.text.saw ? [s.text.saw] : [])))];

function ProducedList({ text }: { text: PieceView['steps'][number]['text'] }) {
  const offcuts = text.produced.filter((p) => p.role === 'offcut');
  return (
    <div className="text-sm print:text-[8px] print:leading-tight">
      {text.frees.length > 0 && (
        <div>
          <span className="text-graphite-mute">Frees </span>
          {text.frees.map((f) => (
            <span
              key={f}
              className="mr-1 inline-block rounded bg-sage-wash px-1.5 font-medium text-sage print:bg-white print:px-0 print:text-graphite"
            >
              {f}
            </span>
          ))}
        </div>
      )}
      {offcuts.map((o) => (
        <div key={o.name} className="text-amber print:text-graphite">
          Keep offcut {o.name}: {o.size}
        </div>
      ))}
      {text.produced.some((p) => p.role === 'waste') && <div className="text-graphite-mute">Waste falls off the free side</div>}
    </div>
  );
}
