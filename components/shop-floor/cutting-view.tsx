'use client';

import Link from 'next/link';
import { useEffect, useEffectEvent, useMemo, useState, useSyncExternalStore } from 'react';
import { ApiError } from '@/client/api';
import { NARROW_HOW } from '@/lib/saw-order/describe-step';
import type { PieceView } from '@/lib/saw-order/piece-views';
import { sawProgress } from '@/lib/saw-order/progress';
import type { PlanTicks } from '@/shared/wire/plans';
import { StepDiagram } from '@/components/saw-order/step-diagram';
import { StepKindBadge } from '@/components/saw-order/step-kind-badge';
import { ProgressBar } from './progress-bar';
import { usePlanTicks } from './use-plan-ticks';
import { useWakeLock, type WakeState } from './use-wake-lock';

interface Props {
  planId: string;
  views: PieceView[];
  initial: PlanTicks;
  canFinish: boolean;
}

const time = (iso: string) => new Date(iso).toLocaleTimeString([], { hour: '2-digit', minute: '2-digit' });

/**
 * The cutter's view of one plan: a stock piece at a time, its next cut big, every step a large tick target. Ticks are
 * saved as they are made (optimistically, rolled back on refusal) and refreshed every few seconds, so several cutters
 * on one plan see each other's work.
 */
export function CuttingView({ planId, views, initial, canFinish }: Props) {
  const { ticks: data, refreshFailed, toggle } = usePlanTicks(planId, initial);
  const pieces = useMemo(() => views.map((v) => ({ sawOrder: v.steps.map((s) => s.geometry.step) })), [views]);
  const progress = sawProgress(pieces, data.ticks);
  const [pieceIndex, setPieceIndex] = useState(() => progress.pieces.find((p) => p.next !== null)?.piece ?? 0);
  const [picked, setPicked] = useState<number | null>(null);
  const wake = useWakeLock(true);

  const view = views[pieceIndex];
  const pieceProgress = progress.pieces[pieceIndex];
  const currentN = picked ?? pieceProgress?.next ?? view?.steps.at(-1)?.text.n ?? null;
  const current = view?.steps.find((s) => s.text.n === currentN) ?? null;
  const tickOf = (piece: number, step: number) => data.ticks.find((t) => t.piece === piece && t.step === step);

  const set = (step: number, done: boolean) => {
    setPicked(null);
    toggle.mutate({ piece: pieceIndex, step, done });
  };

  // One key ticks the cut on screen: Space, unless a field or a control of its own has the focus.
  const onDoneKey = useEffectEvent(() => {
    if (current && !tickOf(pieceIndex, current.text.n)) set(current.text.n, true);
  });
  // The hint offers Space only once the key works: in the browser after hydration, not in the page's first HTML.
  const spaceWorks = useSyncExternalStore(
    noSubscription,
    () => true,
    () => false,
  );
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      if (e.code !== 'Space' || e.repeat || e.altKey || e.ctrlKey || e.metaKey || e.shiftKey) return;
      const target = e.target instanceof Element ? e.target : null;
      if (target?.closest('input, textarea, select, button, a, [contenteditable], [role="checkbox"]')) return;
      e.preventDefault();
      onDoneKey();
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, []);

  if (!view) return <p className="card px-4 py-6">This plan places no parts, so there is nothing to cut.</p>;
  const currentTick = current ? tickOf(pieceIndex, current.text.n) : undefined;

  return (
    <div className="space-y-3 sm:space-y-5">
      <ProgressBar done={progress.done} total={progress.total} label={`${progress.done} of ${progress.total} cuts done on this plan`} />

      {toggle.isError && (
        <p role="alert" className="rounded-md border border-brick/40 bg-brick-wash px-4 py-3 text-brick">
          {toggle.error instanceof ApiError ? toggle.error.message : 'That tick was not saved.'} Nothing else changed; try again.
        </p>
      )}
      {refreshFailed && (
        <p role="alert" className="rounded-md border border-amber/40 bg-amber-wash px-4 py-3 text-amber">
          Could not refresh the ticks from the server; showing what this screen last saw.
        </p>
      )}

      {progress.finished && (
        <div className="flex flex-wrap items-center justify-between gap-4 rounded-lg border border-sage/40 bg-sage-wash px-5 py-4" role="status">
          <div>
            <p className="text-lg font-semibold text-sage">Every cut is done.</p>
            <p className="text-sm text-graphite-soft">Finish the plan to take its stock off the rack and put its offcuts on it.</p>
          </div>
          {canFinish && (
            <Link href={`/plans/${planId}/finish`} className="btn-accent min-h-14 px-6 text-base">
              Finish the plan
            </Link>
          )}
        </div>
      )}

      <nav aria-label="Stock pieces" className="-mx-1 flex gap-2 overflow-x-auto px-1 pb-1">
        {views.map((v, i) => {
          const p = progress.pieces[i];
          const active = i === pieceIndex;
          return (
            <button
              key={v.index}
              type="button"
              onClick={() => {
                setPieceIndex(i);
                setPicked(null);
              }}
              aria-current={active ? 'true' : undefined}
              className={`min-h-14 min-w-28 shrink-0 rounded-lg border-2 px-4 py-2 text-left ${active ? 'border-oak bg-oak-wash' : 'border-paper-edge bg-white hover:bg-paper-deep'}`}
            >
              <span className="block whitespace-nowrap font-semibold">{v.heading}</span>
              <span className={`block font-mono text-sm ${p.next === null && p.total > 0 ? 'text-sage' : 'text-graphite-mute'}`}>
                {p.done}/{p.total}
                {p.next === null && p.total > 0 ? ' ✓ all cut' : ''}
              </span>
            </button>
          );
        })}
      </nav>

      <section className="card p-4 sm:p-5" aria-labelledby="current-step" data-testid="current-cut">
        <p className="mb-2 text-sm text-graphite-mute">
          {view.heading} · {view.detail}
        </p>
        {current ? (
          <div className="grid gap-3 lg:gap-y-4 [grid-template-areas:'info'_'diagram'_'act'_'more'] lg:grid-cols-2 lg:grid-rows-[auto_auto_1fr] lg:gap-x-6 xl:grid-cols-[minmax(0,3fr)_minmax(0,2fr)] lg:[grid-template-areas:'diagram_info'_'diagram_act'_'diagram_more']">
            <div className="@container flex min-w-0 flex-col gap-2 lg:gap-3 [grid-area:info]">
              <div className="flex flex-wrap items-center gap-x-3 gap-y-1">
                <h2 id="current-step" className="flex items-baseline gap-1.5">
                  <span className="sr-only">Cut </span>
                  <span className="font-mono text-4xl leading-none">{current.text.n}</span>
                  <span className="text-sm font-normal text-graphite-mute">of {view.steps.length}</span>
                </h2>
                <StepKindBadge kind={current.text.kind} trim={current.text.trim} narrow={current.text.narrow} large />
                {current.text.saw && (
                  <span className="text-base font-semibold text-graphite" data-testid="current-saw">
                    <span className="font-normal text-graphite-mute">Saw:</span> {current.text.saw}
                  </span>
                )}
              </div>
              <div>
                <div className="text-sm text-graphite-mute">
                  <span className="uppercase tracking-wide">Fence</span> · cutting piece{' '}
                  <strong className="text-graphite">{current.text.piece}</strong>
                </div>
                <div
                  className="whitespace-nowrap font-mono font-semibold leading-none"
                  style={{ fontSize: fenceFontSize(current.text.fence) }}
                  data-testid="current-fence"
                >
                  {current.text.fence}
                </div>
                <div className="mt-1 text-base text-graphite-soft">
                  cut length <span className="whitespace-nowrap font-mono">{current.text.length}</span>
                </div>
                {current.text.narrow && (
                  <p className="mt-2 rounded-md border border-brick/40 bg-brick-wash px-3 py-2 font-medium text-brick" role="note">
                    Cut it {NARROW_HOW}.
                  </p>
                )}
              </div>
            </div>
            <StepDiagram
              geometry={current.geometry}
              stock={view.stock}
              parts={view.parts}
              className="h-auto max-h-[32vh] w-full [grid-area:diagram] lg:max-h-[55vh]"
            />
            <div className="flex flex-col gap-2 [grid-area:act]">
              {currentTick ? (
                <button
                  key={`undo-${current.text.n}`}
                  type="button"
                  className="btn-quiet min-h-20 w-full text-xl"
                  onClick={() => set(current.text.n, false)}
                >
                  Cut {current.text.n} is ticked — undo
                </button>
              ) : (
                <button
                  key={`done-${current.text.n}`}
                  type="button"
                  className="btn-accent min-h-20 w-full text-2xl"
                  onClick={() => set(current.text.n, true)}
                >
                  Done — cut {current.text.n}
                </button>
              )}
              <p className="text-sm text-graphite-mute" data-testid="cutting-hints">
                {!currentTick && spaceWorks && (
                  <>
                    Or press <kbd className="rounded border border-paper-edge bg-paper px-1.5 font-mono text-graphite">Space</kbd> for Done.{' '}
                  </>
                )}
                <WakeNote state={wake} />
              </p>
            </div>
            {(current.text.frees.length > 0 || current.text.produced.some((p) => p.role === 'offcut')) && (
              <div className="flex flex-col gap-2 [grid-area:more]">
                {current.text.frees.length > 0 && (
                  <div>
                    <div className="text-sm text-graphite-mute">Frees</div>
                    <div className="flex flex-wrap gap-2">
                      {current.text.frees.map((f) => (
                        <span key={f} className="rounded-md bg-sage-wash px-2.5 py-1 text-lg font-medium text-sage">
                          {f}
                        </span>
                      ))}
                    </div>
                  </div>
                )}
                {current.text.produced
                  .filter((p) => p.role === 'offcut')
                  .map((o) => (
                    <p key={o.name} className="text-amber">
                      Keep offcut {o.name} (<span className="whitespace-nowrap">{o.size}</span>) for the rack.
                    </p>
                  ))}
              </div>
            )}
          </div>
        ) : (
          <p className="text-graphite-mute">No saw order for this piece yet.</p>
        )}
      </section>

      <section aria-labelledby="all-steps">
        <h2 id="all-steps" className="mb-2">
          Every cut on {view.heading}
        </h2>
        <ol className="grid gap-2 md:grid-cols-2">
          {view.steps.map(({ text }) => {
            const tick = tickOf(pieceIndex, text.n);
            const isCurrent = text.n === currentN;
            return (
              <li
                key={text.n}
                className={`flex items-stretch overflow-hidden rounded-lg border-2 bg-white ${isCurrent ? 'border-oak' : 'border-paper-edge'}`}
              >
                <button
                  type="button"
                  role="checkbox"
                  aria-checked={!!tick}
                  aria-label={`Cut ${text.n} done`}
                  onClick={() => set(text.n, !tick)}
                  className={`flex min-h-16 w-16 shrink-0 items-center justify-center ${tick ? 'bg-sage' : 'bg-paper-deep hover:bg-paper-edge'}`}
                >
                  <span
                    aria-hidden
                    className={`flex h-8 w-8 items-center justify-center rounded-md border-2 text-xl font-bold ${tick ? 'border-white text-white' : 'border-graphite-faint bg-white'}`}
                  >
                    {tick ? '✓' : ''}
                  </span>
                </button>
                <button
                  type="button"
                  onClick={() => setPicked(text.n)}
                  className="flex min-h-16 min-w-0 flex-1 flex-col justify-center px-3 py-1.5 text-left hover:bg-paper"
                >
                  <span className="flex flex-wrap items-center gap-x-2 gap-y-1">
                    <span className="font-mono text-lg font-semibold">{text.n}</span>
                    <StepKindBadge kind={text.kind} trim={text.trim} narrow={text.narrow} />
                    <span className="whitespace-nowrap font-mono text-lg">{text.fence}</span>
                    <span className="text-sm text-graphite-mute">piece {text.piece}</span>
                  </span>
                  <span className="text-xs text-graphite-mute" suppressHydrationWarning>
                    {tick
                      ? `Ticked by ${tick.doneBy ?? 'someone'} at ${time(tick.doneAt)}`
                      : text.frees.length
                        ? `Frees ${text.frees.join(', ')}`
                        : '\u00a0'}
                  </span>
                </button>
              </li>
            );
          })}
        </ol>
      </section>
    </div>
  );
}

/**
 * The fence setting as large as fits on one line: IBM Plex Mono advances 0.6 em a character (a little more for
 * the fallback ≈), so n characters fit the column at 100cqi / (0.64 n), up to 8 rem.
 */
export function fenceFontSize(text: string): string {
  const chars = Math.max([...text].length, 4);
  return `min(8rem, calc(100cqi / ${(chars * 0.64).toFixed(2)}))`;
}

function WakeNote({ state }: { state: WakeState }) {
  if (state === 'on') return <span data-testid="wake-state">The screen stays on while this page is open.</span>;
  if (state === 'off')
    return <span data-testid="wake-state">The screen may dim: this browser did not keep it awake (tap the page to try again).</span>;
  if (state === 'unsupported') return <span data-testid="wake-state">This browser cannot keep the screen awake: set its screen timeout longer.</span>;
  return null;
}

/** Nothing to listen to: whether the page runs in the browser does not change. */
const noSubscription = () => () => {};
