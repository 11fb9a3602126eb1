'use client';

import { useEffect, useRef, useState } from 'react';
import { startBenchCheckWorker, type BenchCheckWorker } from '@/client/bench-check-worker';
import type { BenchDoc } from '@/lib/layout-bench/document';
import { checkDoc, type LiveCheck } from '@/lib/layout-bench/live-check';
import type { NestRequest } from '@/shared/schemas/nesting';

const NOT_YET: LiveCheck = { violations: [], byPlacement: new Map(), byPiece: new Map(), general: [], leftovers: new Map() };

/**
 * The live check of the bench's document, run in a Web Worker: `pending` while the check of the document as it
 * stands has not answered yet (the last answer is kept on screen meanwhile). Only the answer for the latest document
 * is taken; without Worker support (or if the worker fails) the check runs here instead.
 */
export function useLiveCheck(request: NestRequest, doc: BenchDoc): { check: LiveCheck; pending: boolean } {
  const [answer, setAnswer] = useState<{ check: LiveCheck; doc: BenchDoc; request: NestRequest } | null>(null);
  const worker = useRef<BenchCheckWorker | null>(null);
  const latest = useRef(0);

  useEffect(() => {
    if (typeof Worker === 'undefined') return;
    worker.current = startBenchCheckWorker();
    return () => {
      worker.current?.terminate();
      worker.current = null;
    };
  }, []);

  useEffect(() => {
    const asked = ++latest.current;
    const take = (check: LiveCheck) => asked === latest.current && setAnswer({ check, doc, request });
    const here = () => take(checkDoc(request, doc));
    if (!worker.current) return void Promise.resolve().then(here);
    worker.current.check(request, doc).then(take, here);
  }, [request, doc]);

  return { check: answer?.check ?? NOT_YET, pending: !answer || answer.doc !== doc || answer.request !== request };
}
