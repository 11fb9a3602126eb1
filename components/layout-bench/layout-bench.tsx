'use client';

import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query';
import dynamic from 'next/dynamic';
import { useRouter } from 'next/navigation';
import { useCallback, useEffect, useMemo, useRef, useState, type KeyboardEvent } from 'react';
import { useStore } from 'zustand';
import { NestProgressBar } from '@/components/nesting/nest-progress';
import { useNestingWorker } from '@/components/nesting/use-nesting-worker';
import { ApiError, call } from '@/client/api';
import { docToPlan, planToDoc, type PartInfo } from '@/lib/layout-bench/document';
import { prepareRenest } from '@/lib/layout-bench/renest';
import { ariaKeys, commandsFor, keyHints, pressKey, type CommandHost } from '@/components/layout-bench/commands';
import { IDLE, applyGestureEffects, step, type Gesture } from '@/components/layout-bench/gesture';
import { createBenchStore, hasUnsavedChanges, type BenchStore } from '@/components/layout-bench/store';
import { fitView, layoutPieces } from '@/lib/layout-bench/world';
import { rebuildCuts } from '@/lib/nesting';
import { readBenchPlan } from '@/lib/layout-bench/read-bench-plan';
import { formatLength } from '@/lib/units/format-length';
import { nestRequestSchema, type NestRequest } from '@/shared/schemas/nesting';
import type { ShopUnits } from '@/shared/schemas/units';
import { useLiveCheck } from './use-live-check';
import { PIECE_KIND_LABELS } from '@/shared/schemas/nesting';
import type { PlanForBench } from '@/shared/wire/plans';

const BenchCanvas = dynamic(() => import('./bench-canvas'), {
  ssr: false,
  loading: () => <p className="p-4 text-sm text-graphite-mute">Setting out the bench…</p>,
});

/** The Layout bench for a saved plan: every Sheet map and Board map at once, editable while the plan is a draft. */
export function LayoutBench({ planId, initial, editable, units }: { planId: string; initial?: PlanForBench; editable: boolean; units: ShopUnits }) {
  // The page read the plan already: the bench starts from it, and asks again only after a save.
  const plan = useQuery({ queryKey: ['plan', planId], queryFn: () => call('GET /api/plans/:id', { params: { id: planId } }), initialData: initial });
  if (plan.isPending) return <p className="text-sm text-graphite-mute">Loading the plan…</p>;
  if (plan.isError)
    return (
      <p className="field-error" role="alert">
        Could not load the plan: {plan.error.message}
      </p>
    );
  return <BenchEditor key={plan.data.updatedAt} data={plan.data} editable={editable && plan.data.status === 'draft'} units={units} />;
}

function BenchEditor({ data, editable, units }: { data: PlanForBench; editable: boolean; units: ShopUnits }) {
  const queryClient = useQueryClient();
  const router = useRouter();
  const request = useMemo(() => nestRequestSchema.parse(data.request), [data.request]);
  const parts = useMemo(() => new Map<string, PartInfo>(request.parts.map((p) => [p.id, p])), [request]);
  const [store] = useState<BenchStore>(() =>
    createBenchStore(planToDoc(readBenchPlan(data.document), request), { parts, kerf: request.settings.kerf }),
  );
  const doc = useStore(store, (s) => s.doc);
  const selection = useStore(store, (s) => s.view.selection);
  // The commands read the store when drawn: subscribe to what their labels and enabled states follow.
  useStore(store, (s) => s.past.length);
  useStore(store, (s) => s.future.length);
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
      call('PUT /api/plans/:id', {
        params: { id: data.id },
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

  const problems = check.violations.length;
  // The commands (components/layout-bench/commands.ts): the toolbar and the keyboard both run them from this one table.
  const gesture = useRef<Gesture>(IDLE);
  const commands = useMemo(() => commandsFor(editable), [editable]);
  const host: CommandHost = {
    store,
    editable,
    renesting: worker.running,
    saving: save.isPending,
    checkPending: pending,
    problems,
    notify: setNotice,
    save: () => save.mutate(),
    renest: () => void renest(),
    fit,
    cancelGesture() {
      const out = step(gesture.current, { type: 'cancel' });
      gesture.current = out.state;
      applyGestureEffects(store, frames, out.effects, 0);
      return out.effects.length > 0;
    },
  };
  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (pressKey(commands, host, e)) e.preventDefault();
  };
  const hints = keyHints(commands);
  // The host's cancelGesture touches the gesture ref on Escape only; labels and enabled states read the store.
  // eslint-disable-next-line react-hooks/refs
  const buttons = commands.filter((c) => c.button).map((command) => ({ command, enabled: command.enabled(host), label: command.label(host) }));
  const lockedCount = Object.values(doc.placements).filter((p) => p.locked).length;
  const pieceCaption = useCallback(
    (i: number) => {
      const p = doc.pieces[i];
      return `${String.fromCharCode(65 + (i % 26))}${i >= 26 ? Math.floor(i / 26) : ''} · ${PIECE_KIND_LABELS[p.kind]} ${fmt(p.length)} × ${fmt(p.width)} · ${fmt(p.thickness)} ${p.material}`;
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
        {buttons.map(({ command: c, enabled, label }) => (
          <button
            key={c.id}
            type="button"
            className={c.button === 'accent' ? 'btn-accent' : 'btn-quiet'}
            onClick={() => c.run(host)}
            disabled={!enabled}
            aria-keyshortcuts={ariaKeys(c)}
          >
            {label}
          </button>
        ))}
      </div>
      {editable && (
        <p className="text-xs text-graphite-mute" data-testid="bench-keys">
          {problems > 0 && <strong className="mr-2 font-medium text-brick">Fix the problems below to save.</strong>}
          On the bench: drag a part;{' '}
          {hints.map((h, i) => (
            <span key={h.keys}>
              <kbd>{h.keys}</kbd> {h.does}
              {i < hints.length - 1 ? ', ' : '.'}
            </span>
          ))}
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
          aria-label={`Layout bench canvas: drag parts${hints.length ? '; ' : ''}${hints.map((h) => `${h.keys} ${h.does}`).join(', ')}`}
          data-testid="bench-canvas"
          role="application"
        >
          <BenchCanvas
            gesture={gesture}
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
