'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import dynamic from 'next/dynamic';
import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { useStore } from 'zustand';
import { NestProgressBar } from '@/components/nesting/nest-progress';
import { useNestingWorker } from '@/components/nesting/use-nesting-worker';
import { api, ApiError } from '@/lib/client/api';
import { docToPlan, planToDoc, type PartInfo } from '@/lib/layout-bench/document';
import { prepareRenest } from '@/lib/layout-bench/renest';
import { createBenchStore, hasUnsavedChanges, mayRotate, type BenchStore } from '@/lib/layout-bench/store';
import { fitView, layoutPieces } from '@/lib/layout-bench/world';
import { rebuildCuts } from '@/lib/nesting';
import { readBenchPlan } from '@/lib/layout-bench/read-bench-plan';
import { formatLength } from '@/lib/units/format-length';
import { nestRequestSchema, type NestRequest } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';
import { useLiveCheck } from './use-live-check';

const BenchCanvas = dynamic(() => import('./bench-canvas'), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-graphite-mute">Setting out the bench…</p>,
});

interface PlanResponse {
  id: string;
  status: string;
  updatedAt: string;
  request: unknown;
  document: unknown;
}

const KIND = { sheet: 'Sheet', board: 'Board', offcut: 'Offcut' } as const;
const NUDGE_MM = 1;
const BIG_NUDGE_MM = 10;

/** The Layout bench for a saved plan: every Sheet map and Board map at once, editable while the plan is a draft. */
export function LayoutBench({ planId, editable, units }: { planId: string; editable: boolean; units: ShopUnits }) {
  const plan = useQuery({ queryKey: ['plan', planId], queryFn: () => api<PlanResponse>(`/api/plans/${planId}`) });
  if (plan.isPending) return <p className="text-sm text-graphite-mute">Loading the plan…</p>;
  if (plan.isError)
    return (
      <p className="field-error" role="alert">
        Could not load the plan: {plan.error.message}
      </p>
    );
  return <BenchEditor key={plan.data.updatedAt} data={plan.data} editable={editable && plan.data.status === 'draft'} units={units} />;
}

function BenchEditor({ data, editable, units }: { data: PlanResponse; editable: boolean; units: ShopUnits }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const request = useMemo(() => nestRequestSchema.parse(data.request), [data.request]);
  const parts = useMemo(() => new Map<string, PartInfo>(request.parts.map((p) => [p.id, p])), [request]);
  const [store] = useState<BenchStore>(() =>
    createBenchStore(planToDoc(readBenchPlan(data.document), request), { parts, kerf: request.settings.kerf }),
  );
  const doc = useStore(store, (s) => s.doc);
  const selection = useStore(store, (s) => s.view.selection);
  const canUndo = useStore(store, (s) => s.past.length > 0);
  const canRedo = useStore(store, (s) => s.future.length > 0);
  const dirty = useStore(store, hasUnsavedChanges);
  const { check, pending } = useLiveCheck(request, doc);
  const frames = useMemo(() => layoutPieces(doc.pieces), [doc.pieces]);
  const fmt = useCallback((mm: number) => formatLength(mm, units), [units]);
  const [notice, setNotice] = useState<string | null>(null);
  const [base, setBase] = useState(data.updatedAt);
  const worker = useNestingWorker();

  // Canvas size follows its box; until the box is measured, nothing is fitted (a phone's box is not 900 px wide).
  const box = useRef<HTMLDivElement>(null);
  const [size, setSize] = useState({ width: 900, height: 560, measured: false });
  useEffect(() => {
    const el = box.current;
    if (!el) return;
    const ro = new ResizeObserver(([e]) => setSize({ width: Math.max(320, Math.floor(e.contentRect.width)), height: 560, measured: true }));
    ro.observe(el);
    return () => ro.disconnect();
  }, []);

  // Leaving with unsaved layout changes asks first.
  useEffect(() => {
    if (!dirty || !editable) return;
    const warn = (e: BeforeUnloadEvent) => e.preventDefault();
    window.addEventListener('beforeunload', warn);
    return () => window.removeEventListener('beforeunload', warn);
  }, [dirty, editable]);

  const fit = useCallback(() => store.getState().setCamera(fitView(frames, size.width, size.height)), [frames, size, store]);
  const fitted = useRef(false);
  useEffect(() => {
    if (!fitted.current && size.measured) {
      fitted.current = true;
      fit();
    }
  }, [fit, size.measured]);

  const save = useMutation({
    mutationFn: () =>
      api<{ updatedAt: string }>(`/api/plans/${data.id}`, {
        method: 'PUT',
        body: { plan: rebuildCuts(request, docToPlan(store.getState().doc)), baseUpdatedAt: base },
      }),
    onSuccess: (res) => {
      setBase(res.updatedAt);
      store.getState().markSaved();
      setNotice('Saved. The saw order was rebuilt from this layout.');
      void queryClient.invalidateQueries({ queryKey: ['plans'] });
      router.refresh(); // the figures above the bench are read on the server
    },
  });

  const renest = async () => {
    const job = prepareRenest(request as NestRequest, store.getState().doc);
    setNotice(null);
    const outcome = await worker.run(job.request);
    if (!outcome.ok)
      return setNotice(`Re-nest failed: ${outcome.error === 'failed' ? outcome.message : outcome.issues.map((i) => i.message).join('; ')}`);
    store.getState().replaceDoc(job.merge(outcome.plan));
    setNotice('Re-nested the unlocked parts around the locked ones. Undo puts the old layout back.');
  };

  const rotate = () => {
    const refused = store.getState().rotate(store.getState().view.selection);
    if (refused.length)
      setNotice(
        `${refused.length} part${refused.length === 1 ? '' : 's'} not turned: locked, or the grain must run along the part's length on this stock.`,
      );
  };
  const toggleLock = () => {
    const s = store.getState();
    const keys = s.view.selection;
    s.setLocked(keys, !keys.every((k) => s.doc.placements[k]?.locked));
  };

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    const s = store.getState();
    const mod = e.ctrlKey || e.metaKey;
    if (mod && e.key.toLowerCase() === 'z') {
      e.preventDefault();
      if (e.shiftKey) s.redo();
      else s.undo();
      return;
    }
    if (mod && e.key.toLowerCase() === 'y') {
      e.preventDefault();
      s.redo();
      return;
    }
    if (e.key === 'Escape') {
      if (s.view.drag) s.cancelDrag();
      else s.select([]);
      return;
    }
    if (!editable) return;
    const step = e.shiftKey ? BIG_NUDGE_MM : NUDGE_MM;
    const arrows: Record<string, [number, number]> = { ArrowLeft: [-step, 0], ArrowRight: [step, 0], ArrowUp: [0, -step], ArrowDown: [0, step] };
    if (arrows[e.key] && s.view.selection.length) {
      e.preventDefault();
      s.nudge(s.view.selection, ...arrows[e.key]);
    } else if (e.key.toLowerCase() === 'r' && !mod) rotate();
    else if (e.key.toLowerCase() === 'l' && !mod) toggleLock();
  };

  const problems = check.violations.length;
  const lockedCount = Object.values(doc.placements).filter((p) => p.locked).length;
  const pieceCaption = useCallback(
    (i: number) => {
      const p = doc.pieces[i];
      return `${String.fromCharCode(65 + (i % 26))}${i >= 26 ? Math.floor(i / 26) : ''} · ${KIND[p.kind]} ${fmt(p.length)} × ${fmt(p.width)} · ${fmt(p.thickness)} ${p.material}`;
    },
    [doc.pieces, fmt],
  );
  const one = selection.length === 1 ? doc.placements[selection[0]] : undefined;

  return (
    <section aria-labelledby="bench" className="space-y-3">
      <div className="flex flex-wrap items-center gap-2">
        <h2 id="bench" className="mr-auto">
          Layout bench
        </h2>
        {editable && (
          <>
            <button type="button" className="btn-quiet" onClick={() => store.getState().undo()} disabled={!canUndo}>
              Undo
            </button>
            <button type="button" className="btn-quiet" onClick={() => store.getState().redo()} disabled={!canRedo}>
              Redo
            </button>
            <button
              type="button"
              className="btn-quiet"
              onClick={rotate}
              disabled={!selection.length || !selection.some((k) => mayRotate(doc, store.getState().context, k))}
            >
              Turn
            </button>
            <button type="button" className="btn-quiet" onClick={toggleLock} disabled={!selection.length}>
              {selection.length && selection.every((k) => doc.placements[k]?.locked) ? 'Unlock' : 'Lock'}
            </button>
            <button type="button" className="btn-quiet" onClick={renest} disabled={worker.running}>
              Re-nest unlocked
            </button>
          </>
        )}
        <button type="button" className="btn-quiet" onClick={fit}>
          Fit all
        </button>
        {editable && (
          <button type="button" className="btn-accent" disabled={save.isPending || !dirty || pending || problems > 0} onClick={() => save.mutate()}>
            {save.isPending ? 'Saving…' : 'Save layout'}
          </button>
        )}
      </div>
      {editable && (
        <p className="text-xs text-graphite-mute" data-testid="bench-keys">
          {problems > 0 && <strong className="mr-2 font-medium text-brick">Fix the problems below to save.</strong>}
          On the bench: drag a part; arrows nudge it, <kbd>R</kbd> turns it, <kbd>L</kbd> locks it, <kbd>Ctrl/Cmd+Z</kbd> undoes,{' '}
          <kbd>Ctrl/Cmd+Shift+Z</kbd> redoes.
        </p>
      )}

      {worker.running && (
        <NestProgressBar
          progress={worker.progress}
          budgetMs={request.settings.timeBudgetMs}
          label="Re-nesting the unlocked parts"
          onCancel={worker.cancel}
        />
      )}
      {notice && (
        <p className="text-sm text-sage" role="status">
          {notice}
        </p>
      )}
      {save.error && (
        <div className="field-error" role="alert">
          {save.error.message}
          {save.error instanceof ApiError && (
            <ul className="ml-5 list-disc">
              {Object.values(save.error.fields)
                .flat()
                .slice(0, 8)
                .map((m) => (
                  <li key={m}>{m}</li>
                ))}
            </ul>
          )}
        </div>
      )}

      <div className="grid gap-3 lg:grid-cols-[minmax(0,1fr)_18rem]">
        <div
          ref={box}
          tabIndex={0}
          onKeyDown={onKeyDown}
          className="card relative overflow-hidden bg-paper-deep/40 focus-visible:outline-2"
          aria-label="Layout bench canvas: drag parts, arrows nudge, R turns, L locks, Ctrl+Z undoes"
          data-testid="bench-canvas"
          role="application"
        >
          <BenchCanvas
            store={store}
            frames={frames}
            parts={parts}
            check={check}
            editable={editable}
            width={size.width}
            height={size.height}
            fmt={fmt}
            pieceCaption={pieceCaption}
          />
        </div>
        <aside className="space-y-3 text-sm">
          <div className="card p-3" data-testid="bench-status" data-pending={pending} aria-busy={pending}>
            {check.totals && (
              <p className="mb-2 text-graphite-soft" data-testid="bench-figures">
                As laid out: <strong>{check.totals.pieces}</strong> stock pieces, <strong>{(check.totals.yield * 100).toFixed(1)} %</strong> yield
              </p>
            )}
            {pending && problems === 0 ? (
              <p className="font-medium text-graphite-mute" role="status">
                Checking the layout…
              </p>
            ) : problems === 0 ? (
              <p className="font-medium text-sage">Every part can be cut free with straight through-cuts.</p>
            ) : (
              <>
                <p className="font-medium text-brick">
                  {problems} problem{problems === 1 ? '' : 's'}: saving is refused until they are fixed.
                  {pending && <span className="font-normal text-graphite-mute"> Checking the change…</span>}
                </p>
                <ul className="mt-2 max-h-48 list-disc space-y-1 overflow-y-auto pl-5 text-brick" aria-label="Problems">
                  {check.violations.slice(0, 30).map((v, i) => (
                    <li key={i}>{v.message}</li>
                  ))}
                </ul>
              </>
            )}
          </div>
          <div className="card p-3">
            {one ? (
              <dl className="grid grid-cols-[auto_1fr] gap-x-3 gap-y-1" aria-label="Selected part">
                <dt className="text-graphite-mute">Part</dt>
                <dd className="font-medium">
                  {one.label || one.partId} #{one.instance}
                </dd>
                <dt className="text-graphite-mute">Size</dt>
                <dd className="num text-left">
                  {fmt(parts.get(one.partId)?.length ?? one.w)} × {fmt(parts.get(one.partId)?.width ?? one.h)}
                </dd>
                <dt className="text-graphite-mute">From corner</dt>
                <dd className="num whitespace-normal text-left">
                  <span className="whitespace-nowrap">{fmt(one.x)} along,</span> <span className="whitespace-nowrap">{fmt(one.y)} across</span>
                </dd>
                <dt className="text-graphite-mute">Grain</dt>
                <dd>
                  {parts.get(one.partId)?.grain === 'any' ? 'Either way' : 'Along its length'}
                  {one.rotated ? ' · turned' : ''}
                </dd>
                <dt className="text-graphite-mute">Locked</dt>
                <dd>{one.locked ? 'Yes' : 'No'}</dd>
              </dl>
            ) : (
              <p className="text-graphite-mute">
                {selection.length
                  ? `${selection.length} parts selected.`
                  : 'Click a part to select it; shift-click adds. Drag empty space to pan, scroll to zoom.'}
              </p>
            )}
          </div>
          <p className="text-xs text-graphite-mute">
            {editable ? `${lockedCount} locked. ` : 'Read only: only a draft plan can be changed. '}
            {editable && `Parts snap to the trimmed edges and to neighbours one kerf (${fmt(request.settings.kerf)}) apart. `}Shaded: waste (trim,
            kerf, scraps); green dashes: offcuts to keep.
          </p>
        </aside>
      </div>
    </section>
  );
}
