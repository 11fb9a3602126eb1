/**
 * The nesting worker's typed API (client side: `Comlink.wrap<NestingWorkerApi>(worker)`), and the handler behind it,
 * kept here so it runs in Node tests: `workers/nesting.worker.ts` only exposes `createNestingWorkerApi()`.
 */
import { optimize, type OptimizeProgress } from '@/lib/nesting/optimize';
import { nestRequestSchema, type Plan } from '@/shared/schemas/nesting';

export type NestProgress = OptimizeProgress;

export type NestOutcome =
  | { ok: true; plan: Plan }
  | { ok: false; error: 'invalid-request'; issues: { path: string; message: string }[] }
  | { ok: false; error: 'failed'; message: string };

export interface NestingWorkerApi {
  /**
   * Validates `request` (shared `nestRequestSchema`) and nests it. `onProgress` (wrap it in `Comlink.proxy`) hears
   * the best plan so far several times a second. Starting a new run cancels the one still running.
   */
  optimize(request: unknown, onProgress?: (progress: NestProgress) => void): Promise<NestOutcome>;
  /** Stops the search: the running `optimize` resolves with the best plan so far (`plan.cancelled`). */
  cancel(): void;
}

/** Progress messages are sent at most this often. */
export const PROGRESS_INTERVAL_MS = 100;
/**
 * When the search has said nothing new for this long, the last progress is sent again with a fresh time, so the
 * page hears at least 4 messages a second (the packer yields to the event loop every few tens of ms).
 */
export const HEARTBEAT_MS = 150;
const HEARTBEAT_TICK_MS = 50;

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
