/**
 * The layout bench's handle on its live-check Web Worker (`workers/bench-check.worker.ts`): the same `checkDoc` the
 * tests run, off the main thread, so dropping a part among hundreds never stalls a frame. Browser only.
 */
import * as Comlink from 'comlink';
import type { BenchDoc } from '@/lib/layout-bench/document';
import type { LiveCheck } from '@/lib/layout-bench/live-check';
import type { NestRequest } from '@/shared/schemas/nesting';

export interface BenchCheckWorker {
  check(request: NestRequest, doc: BenchDoc): Promise<LiveCheck>;
  terminate(): void;
}

export function startBenchCheckWorker(): BenchCheckWorker {
  const worker = new Worker(new URL('../workers/bench-check.worker.ts', import.meta.url), { type: 'module', name: 'kerfwise-bench-check' });
  const remote = Comlink.wrap<{ check(request: NestRequest, doc: BenchDoc): LiveCheck }>(worker);
  return {
    check: (request, doc) => remote.check(request, doc),
    terminate() {
      remote[Comlink.releaseProxy]();
      worker.terminate();
    },
  };
}
