/**
 * The page's handle on the nesting Web Worker: starts `workers/nesting.worker.ts` as a module worker and wraps it
 * with Comlink. Browser only (call it from an effect or an event handler); `terminate()` when the page leaves.
 */
import * as Comlink from 'comlink';
import type { NestingWorkerApi, NestOutcome, NestProgress } from '@/lib/nesting/worker-api';

export interface NestingWorker {
  /** Nests `request` off the main thread; `onProgress` hears the best plan so far several times a second. */
  optimize(request: unknown, onProgress?: (p: NestProgress) => void): Promise<NestOutcome>;
  /** The running search resolves with its best plan so far. */
  cancel(): Promise<void>;
  terminate(): void;
}

export function startNestingWorker(): NestingWorker {
  const worker = new Worker(new URL('../workers/nesting.worker.ts', import.meta.url), { type: 'module', name: 'kerfwise-nesting' });
  const remote = Comlink.wrap<NestingWorkerApi>(worker);
  return {
    optimize: (request, onProgress) => remote.optimize(request, onProgress ? Comlink.proxy(onProgress) : undefined),
    cancel: () => remote.cancel(),
    terminate() {
      remote[Comlink.releaseProxy]();
      worker.terminate();
    },
  };
}
