/** The nesting worker's handler, kept out of the worker file so it runs in Node tests. */
import { optimize } from '@/lib/nesting/optimize';
import { HEARTBEAT_MS, HEARTBEAT_TICK_MS, PROGRESS_INTERVAL_MS, type NestingWorkerApi, type NestProgress } from '@/lib/nesting/worker-api';
import { nestRequestSchema } from '@/shared/schemas/nesting';

/** The API `workers/nesting.worker.ts` exposes: boundary validation, throttled progress with heartbeat, cancel. */
export function createNestingWorkerApi(): NestingWorkerApi {
  let running: AbortController | null = null;
  return {
    async optimize(request, onProgress) {
      const parsed = nestRequestSchema.safeParse(request);
      if (!parsed.success) {
        return {
          ok: false,
          error: 'invalid-request',
          issues: parsed.error.issues.map((i) => ({ path: i.path.map(String).join('.'), message: i.message })),
        };
      }
      running?.abort();
      const controller = new AbortController();
      running = controller;
      const t0 = performance.now();
      let latest: NestProgress = { elapsedMs: 0, piecesUsed: 0, yield: 0, cost: 0 };
      let lastSent = t0;
      const send = () => {
        if (!onProgress) return;
        lastSent = performance.now();
        // Not awaited: a slow page must not hold the search up.
        void Promise.resolve(onProgress({ ...latest, elapsedMs: lastSent - t0 })).catch(() => {});
      };
      const report = (p: NestProgress) => {
        latest = p;
        if (performance.now() - lastSent >= PROGRESS_INTERVAL_MS) send();
      };
      const heartbeat = onProgress
        ? setInterval(() => {
            if (performance.now() - lastSent >= HEARTBEAT_MS) send();
          }, HEARTBEAT_TICK_MS)
        : undefined;
      try {
        const plan = await optimize(parsed.data, { signal: controller.signal, onProgress: onProgress && report });
        return { ok: true, plan };
      } catch (e) {
        return { ok: false, error: 'failed', message: e instanceof Error ? e.message : String(e) };
      } finally {
        clearInterval(heartbeat);
        if (running === controller) running = null;
      }
    },
    cancel() {
      running?.abort();
    },
  };
}
