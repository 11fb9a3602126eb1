'use client';

import { useEffect, useRef, useState } from 'react';
import { startBenchCheckWorker, type BenchCheckWorker } from '@/client/bench-check-worker';
import { createCheckChannel, type ChannelState, type CheckChannel } from '@/lib/layout-bench/check-channel';
import type { BenchDoc } from '@/lib/layout-bench/document';
import { checkRevision, type LiveCheck } from '@/lib/layout-bench/live-check';
import type { NestRequest } from '@/shared/schemas/nesting';

const NOT_YET: LiveCheck = { violations: [], byPlacement: new Map(), byPiece: new Map(), general: [], leftovers: new Map() };

type Input = { request: NestRequest; doc: BenchDoc };

/**
 * The live check of the bench's document, run in a Web Worker: `pending` while the check of the document as it
 * stands has not answered yet (the last answer is kept on screen meanwhile). Each edit is tagged with a revision and
 * only an answer newer than the one shown is taken (`check-channel.ts`); without Worker support, or if the worker
 * fails, the check runs here instead.
 */
export function useLiveCheck(request: NestRequest, doc: BenchDoc): { check: LiveCheck; pending: boolean } {
  const [state, setState] = useState<ChannelState<Input, LiveCheck>>({ asked: 0, shown: null });
  const channel = useRef<CheckChannel<Input> | null>(null);

  useEffect(() => {
    let worker: BenchCheckWorker | null = null;
    try {
      if (typeof Worker !== 'undefined') worker = startBenchCheckWorker();
    } catch (error) {
      // A browser that refuses the worker (no module workers, a policy): the check runs on the page.
      console.warn('The live check runs on the page:', error);
    }
    const here = (revision: number, input: Input) => Promise.resolve().then(() => checkRevision(revision, input.request, input.doc));
    const run = (revision: number, input: Input) =>
      worker
        ? worker.check(revision, input.request, input.doc).catch((error: unknown) => {
            console.warn('The live check runs on the page:', error);
            worker?.terminate();
            worker = null;
            return here(revision, input);
          })
        : here(revision, input);
    channel.current = createCheckChannel(run, setState);
    return () => {
      channel.current?.dispose();
      channel.current = null;
      worker?.terminate();
    };
  }, []);

  useEffect(() => {
    channel.current?.submit({ request, doc });
  }, [request, doc]);

  const shown = state.shown;
  // Pending until the answer on screen is the one for the document as it stands (not only the latest revision
  // asked: the render with a new document comes before the effect that submits it).
  return { check: shown?.check ?? NOT_YET, pending: !shown || shown.input.doc !== doc || shown.input.request !== request };
}
