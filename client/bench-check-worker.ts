/**
 * The layout bench's handle on its live-check Web Worker (`workers/bench-check.worker.ts`): the same `checkDoc` the
 * tests run, off the main thread, so dropping a part among hundreds never stalls a frame. Each check is tagged with
 * the revision of the edit it judges, and the answer carries it back (`lib/layout-bench/check-channel.ts`).
 * Browser only.
 */
import * as Comlink from 'comlink';
import type { BenchDoc } from '@/lib/layout-bench/document';
import type { checkRevision, LiveCheck } from '@/lib/layout-bench/live-check';
import type { NestRequest } from '@/shared/schemas/nesting';

export interface BenchCheckWorker {
  check(revision: number, request: NestRequest, doc: BenchDoc): Promise<{ revision: number; check: LiveCheck }>;
  terminate(): void;
}

export function startBenchCheckWorker(): BenchCheckWorker {
  const worker = new Worker(new URL('../workers/bench-check.worker.ts', import.meta.url), { type: 'module', name: 'kerfwise-bench-check' });
  const remote = Comlink.wrap<{ check: typeof checkRevision }>(worker);
  // A worker that fails to load or throws at the top level answers nothing: fail the checks waiting on it, so the
  // bench falls back to checking on the page instead of showing "Checking…" for ever.
  const waiting = new Set<(error: unknown) => void>();
  let broken: unknown = null;
  worker.addEventListener('error', (event) => {
    broken = new Error(`the live-check worker failed: ${event.message || 'it did not load'}`);
    for (const fail of waiting) fail(broken);
    waiting.clear();
  });
  return {
    check(revision, request, doc) {
      if (broken) return Promise.reject(broken);
      return new Promise((resolve, reject) => {
        waiting.add(reject);
        remote
          .check(revision, request, doc)
          .then(resolve, reject)
          .finally(() => waiting.delete(reject));
      });
    },
    terminate() {
      remote[Comlink.releaseProxy]();
      worker.terminate();
    },
  };
}
