'use client';

import { useCallback, useEffect, useRef, useState } from 'react';
import { startNestingWorker, type NestingWorker } from '@/client/nesting-worker';
import type { NestOutcome, NestProgress } from '@/lib/nesting/worker-api';

/** One nesting worker for the component's life: run, progress (best plan so far), cancel. */
export function useNestingWorker() {
  const worker = useRef<NestingWorker | null>(null);
  const [running, setRunning] = useState(false);
  const [progress, setProgress] = useState<NestProgress | null>(null);

  useEffect(() => () => worker.current?.terminate(), []);

  const run = useCallback(async (request: unknown): Promise<NestOutcome> => {
    worker.current ??= startNestingWorker();
    setRunning(true);
    setProgress(null);
    try {
      return await worker.current.optimize(request, (p) => setProgress(p));
    } catch (e) {
      return { ok: false, error: 'failed', message: e instanceof Error ? e.message : String(e) };
    } finally {
      setRunning(false);
    }
  }, []);

  const cancel = useCallback(() => void worker.current?.cancel(), []);
  return { run, cancel, running, progress };
}
