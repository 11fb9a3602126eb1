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

/** Progress messages are sent at most this often (the packer reports about 5 times a second). */
export const PROGRESS_INTERVAL_MS = 100;

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
      let last = -Infinity;
      const report = onProgress
        ? (p: NestProgress) => {
            if (p.elapsedMs - last < PROGRESS_INTERVAL_MS) return;
            last = p.elapsedMs;
            // Not awaited: a slow page must not hold the search up.
            void Promise.resolve(onProgress(p)).catch(() => {});
          }
        : undefined;
      try {
        const plan = await optimize(parsed.data, { signal: controller.signal, onProgress: report });
        return { ok: true, plan };
      } catch (e) {
        return { ok: false, error: 'failed', message: e instanceof Error ? e.message : String(e) };
      } finally {
        if (running === controller) running = null;
      }
    },
    cancel() {
      running?.abort();
    },
  };
}
