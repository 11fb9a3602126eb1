/**
 * The nesting worker's typed API for the page: `Comlink.wrap<NestingWorkerApi>(worker)`, passing progress listeners
 * through `Comlink.proxy`. Types and constants only, so importing it never bundles the engine into the page; the
 * handler is `createNestingWorkerApi` in `worker-handler.ts`.
 */
import type { OptimizeProgress } from '@/lib/nesting/optimize';
import type { Plan } from '@/shared/schemas/nesting';

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
/** How often the worker looks whether a heartbeat is due. */
export const HEARTBEAT_TICK_MS = 50;
