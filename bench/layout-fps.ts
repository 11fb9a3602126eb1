/**
 * `npm run bench:layout` — frames on the layout bench while a part is dragged among 340 parts and dropped, in
 * Debian's Chromium (headless, software raster) driven by playwright-core. Builds if there is no build, seeds a
 * fresh embedded data directory with the demo shop, starts `next start`, signs in as the estimator, adds a job of
 * 340 drawer parts, nests it on the page (budget 0) and saves the draft; then, on the bench, drags one part in a
 * circle over its sheet (120 pointer moves 16 ms apart) and drops it, several times, timing every animation frame
 * (requestAnimationFrame) and reading Chromium's long animation frames (Performance API, `long-animation-frame`).
 *
 * Two runs: `worker` (the app as shipped: the live check in its Web Worker) and `page` (the same build with the
 * check's worker refused, so the bench falls back to checking on the page's main thread — as it did before the
 * worker). Targets (issue 14): during the drag ≥ 55 frames per second, and no frame over 50 ms on a drop.
 *
 * Flags: --port N (default 3460 or PORT), --drops N (default 6, the first one on a freshly opened bench), --modes worker,page, --keep (leave the data
 * directory), --no-write. KERFWISE_DIST_DIR picks the build, as for `next start`; CHROMIUM_PATH the browser.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { z } from 'zod';
import { openDatabase } from '@/db/open';
import { fitView, layoutPieces, toScreen } from '@/lib/layout-bench/world';
import { pickMove, type Piece, type Placement } from '@/tests/e2e/support/bench';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemoShop } from '@/seeds/demo-shop';
import { buildIfNeeded, startServer, waitForHealth } from './serve';

const log = (s = '') => process.stdout.write(`${s}\n`);
const MAPLE_23_32 = (23 / 32) * 25.4; // ≈3/4″ maple ply as the demo rack stocks it
const ROWS = [
  { label: 'Drawer side', quantity: 160, length: 400, width: 120 },
  { label: 'Drawer front', quantity: 100, length: 380, width: 110 },
  { label: 'Shelf cleat', quantity: 80, length: 300, width: 60 },
];
const MOVES = 120;
/** In the page: the live check has answered for the layout as it stands. */
const SETTLED = () => document.querySelector('[data-testid="bench-status"]')?.getAttribute('data-pending') !== 'true';
const TARGET = { fps: 55, dropFrameMs: 50 };

const MODES = ['worker', 'page'] as const;
type Mode = (typeof MODES)[number];

const args = z
  .object({
    port: z.coerce
      .number()
      .int()
      .min(1024)
      .max(65535)
      .default(Number(process.env.PORT) || 3460),
    drops: z.coerce.number().int().min(2).max(50).default(6),
    modes: z
      .string()
      .default('worker,page')
      .transform((s) => s.split(',').map((m) => m.trim()))
      .pipe(z.array(z.enum(MODES)).min(1)),
    keep: z.boolean().default(false),
    write: z.boolean().default(true),
  })
  .parse(parseFlags(process.argv.slice(2)));

function parseFlags(argv: string[]): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (let i = 0; i < argv.length; i++) {
    const flag = /^--([a-z-]+)$/.exec(argv[i]);
    if (!flag) throw new Error(`Unknown argument ${argv[i]} (flags: --port N, --drops N, --modes worker,page, --keep, --no-write)`);
    if (flag[1] === 'keep') out.keep = true;
    else if (flag[1] === 'no-write') out.write = false;
    else out[flag[1]] = argv[++i];
  }
  return out;
}

async function seed(dataDir: string) {
  const handle = await openDatabase({ dataDir: path.join(dataDir, 'pglite'), migrate: true });
  try {
    await seedDemoShop(handle.db);
  } finally {
    await handle.close();
  }
}

async function signIn(page: Page, url: string) {
  const estimator = DEMO_PEOPLE.find((p) => p.role === 'estimator')!;
  await page.goto(`${url}/sign-in`);
  await page.getByLabel('E-mail').fill(estimator.email);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByTestId('signed-in-as').waitFor({ timeout: 30_000 });
}

/** A job of 340 parts, nested on the page with no search time and saved as a draft: returns the plan's page. */
async function makePlan(page: Page, url: string): Promise<{ planId: string; planPage: string }> {
  const headers = { origin: url };
  const job = await (await page.request.post(`${url}/api/jobs`, { headers, data: { name: `Frame-rate drawer run ${Date.now()}` } })).json();
  for (const row of ROWS) {
    const res = await page.request.post(`${url}/api/jobs/${job.id}/parts`, {
      headers,
      data: { ...row, thickness: MAPLE_23_32, material: 'Maple ply', grain: 'any' },
    });
    if (res.status() !== 201) throw new Error(`adding parts failed: ${res.status()} ${await res.text()}`);
  }
  await page.goto(`${url}/jobs/${job.id}/plan`);
  await page.getByLabel('Search for (seconds)').fill('0');
  await page.getByRole('button', { name: 'Nest 340 parts' }).click();
  await page.getByTestId('plan-summary').waitFor({ timeout: 120_000 });
  await page.getByRole('button', { name: 'Save as draft plan' }).click();
  await page.getByTestId('bench-status').waitFor({ timeout: 60_000 });
  return { planId: page.url().split('/').pop()!, planPage: page.url() };
}

interface DropFigures {
  dragFps: number;
  dragFrameMs: { median: number; p95: number; max: number };
  /** Longest gap between two animation frames from the drop until the check answered, and 300 ms more. */
  dropLongestFrameMs: number;
  /** From the drop to the status no longer pending (null when the bench never says it is checking). */
  answerMs: number | null;
  /** Longest long-animation-frame entry Chromium reported during the whole drag and drop (0: none over 50 ms). */
  longestLoafMs: number;
}

/**
 * For a saved plan without offcuts (plans saved by older builds): a part and a spot on its own sheet clear of every
 * other part by more than a kerf, found on a 10 mm grid, so the check still runs the through-cut search.
 */
function clearSpot(pieces: Piece[]): { piece: number; part: Placement; to: { x: number; y: number; w: number; h: number } } | null {
  const gap = 4;
  for (let i = pieces.length - 1; i >= 0; i--) {
    const piece = pieces[i];
    for (const part of piece.placements) {
      const others = piece.placements.filter((o) => o !== part);
      for (let y = 20; y + part.h <= piece.width - 20; y += 10) {
        for (let x = 20; x + part.w <= piece.length - 20; x += 10) {
          const clear = others.every((o) => x + part.w + gap <= o.x || o.x + o.w + gap <= x || y + part.h + gap <= o.y || o.y + o.h + gap <= y);
          if (clear && (Math.abs(x - part.x) > 50 || Math.abs(y - part.y) > 50)) return { piece: i, part, to: { x, y, w: part.w, h: part.h } };
        }
      }
    }
  }
  return null;
}

const pct = (sorted: number[], p: number) => sorted[Math.min(sorted.length - 1, Math.floor(sorted.length * p))];
const round = (n: number) => Math.round(n * 10) / 10;

async function measureDrop(page: Page, url: string, planId: string): Promise<DropFigures> {
  const saved = (await (await page.request.get(`${url}/api/plans/${planId}`)).json()).document;
  const canvas = page.getByTestId('bench-canvas').locator('canvas').first();
  await canvas.scrollIntoViewIfNeeded();
  const box = (await canvas.boundingBox())!;
  const frames = layoutPieces(saved.pieces);
  const view = fitView(frames, Math.floor(box.width), Math.floor(box.height));
  // The drop lands where the layout stays cuttable (a part into the largest offcut of its own sheet), so the check
  // does all its work: the through-cut search and the rebuilt cuts (a drop onto another part stops at the overlap).
  const move = pickMove(saved.pieces) ?? clearSpot(saved.pieces);
  if (!move) throw new Error('no part has a clear spot on its sheet: nothing to drop where the check does all its work');
  const piece = frames[move.piece];
  const start = toScreen(view, piece, move.part.x + move.part.w / 2, move.part.y + move.part.h / 2);
  const end = toScreen(view, piece, move.to.x + move.part.w / 2, move.to.y + move.part.h / 2);

  // Browser-side code as text: tsx's transform would wrap named functions in a helper the page does not have.
  await page.evaluate(`(() => {
    const w = window;
    w.__frames = [];
    w.__loaf = [];
    w.__stop = false;
    w.__pending = [];
    const status = document.querySelector('[data-testid="bench-status"]');
    new MutationObserver(() => w.__pending.push([performance.now(), status.getAttribute('data-pending')])).observe(status, { attributes: true, attributeFilter: ['data-pending'] });
    const tick = (t) => {
      w.__frames.push(t);
      if (!w.__stop) requestAnimationFrame(tick);
    };
    requestAnimationFrame(tick);
    try {
      new PerformanceObserver((list) => { for (const e of list.getEntries()) w.__loaf.push(e.duration); }).observe({ type: 'long-animation-frame', buffered: false });
    } catch {
      // An older Chromium without long animation frames: the rAF gaps still tell.
    }
  })()`);
  await page.mouse.move(box.x + start.x, box.y + start.y);
  await page.mouse.down();
  // A circle over the sheet, then to the offcut.
  for (let i = 1; i <= MOVES; i++) {
    const a = (i / MOVES) * Math.PI * 2;
    const to = toScreen(view, piece, piece.w / 2 + Math.cos(a) * piece.w * 0.35, piece.h / 2 + Math.sin(a) * piece.h * 0.35);
    await page.mouse.move(box.x + to.x, box.y + to.y);
    await page.waitForTimeout(16);
  }
  await page.mouse.move(box.x + end.x, box.y + end.y, { steps: 10 });
  await page.waitForTimeout(50);
  const upAt = (await page.evaluate('performance.now()')) as number;
  await page.mouse.up();
  await page.waitForFunction(SETTLED, null, { timeout: 30_000, polling: 10 });
  await page.waitForTimeout(300);
  const { times, loaf, pending } = (await page.evaluate(
    '(() => { window.__stop = true; return { times: window.__frames, loaf: window.__loaf, pending: window.__pending }; })()',
  )) as {
    times: number[];
    loaf: number[];
    pending: [number, string][];
  };
  const said = await page.getByTestId('bench-status').textContent();
  if (said?.includes('overlap') || said?.includes('outside'))
    throw new Error(`the drop was meant to land clear of the other parts, but the bench says: ${said}`);
  // A build whose bench never says it is checking (the check ran inside the render, before the worker) has no answer time.
  const answeredAt = pending.find(([t, v]) => t >= upAt && v === 'false')?.[0] ?? Number.NaN;
  const drag = times.filter((t) => t < upAt);
  const after = times.filter((t) => t >= upAt);
  // The first frame after the drop counts from the last frame before it.
  const dropGaps = [after[0] - drag.at(-1)!, ...after.slice(1).map((t, i) => t - after[i])];
  const gaps = drag
    .slice(1)
    .map((t, i) => t - drag[i])
    .sort((x, y) => x - y);
  // Put the part back for the next drop (one undo step) and wait for that check too.
  await page.getByRole('button', { name: 'Undo' }).click();
  await page.waitForFunction(SETTLED, null, { timeout: 30_000 });
  return {
    dragFps: round(((drag.length - 1) / (drag.at(-1)! - drag[0])) * 1000),
    dragFrameMs: { median: round(pct(gaps, 0.5)), p95: round(pct(gaps, 0.95)), max: round(gaps.at(-1)!) },
    dropLongestFrameMs: round(Math.max(...dropGaps)),
    answerMs: Number.isFinite(answeredAt) ? round(answeredAt - upAt) : null,
    longestLoafMs: round(Math.max(0, ...loaf)),
  };
}

type Storage = Awaited<ReturnType<BrowserContext['storageState']>>;

async function runMode(browser: Browser, url: string, plan: { planId: string; planPage: string }, mode: Mode, storage: Storage) {
  const { planId } = plan;
  const context = await browser.newContext({ viewport: { width: 1440, height: 900 }, storageState: storage });
  if (mode === 'page') {
    // Refuse the live check's worker (only that one), so the bench checks on the main thread, as before issue 14.
    await context.addInitScript(`(() => {
      const Real = window.Worker;
      window.Worker = class extends Real {
        constructor(src, options) {
          if (options && options.name === 'kerfwise-bench-check') throw new Error('bench: the live-check worker is refused for this run');
          super(src, options);
        }
      };
    })()`);
  }
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(plan.planPage);
  await page.waitForFunction(SETTLED, null, { timeout: 60_000 });
  // The first drop on a freshly opened bench (code not yet optimised by the JavaScript engine), then the rest.
  const drops: DropFigures[] = [];
  for (let i = 0; i < args.drops; i++) drops.push(await measureDrop(page, url, planId));
  await page.screenshot({ path: path.join(os.tmpdir(), `kerfwise-bench-layout-${mode}.png`) });
  await context.close();
  if (errors.length) throw new Error(`page errors in the ${mode} run: ${errors.join('; ')}`);
  return drops;
}

function summary(mode: Mode, drops: DropFigures[]) {
  const fps = drops.map((d) => d.dragFps);
  const drop = drops.map((d) => d.dropLongestFrameMs);
  const ok = Math.min(...fps) >= TARGET.fps && Math.max(...drop) <= TARGET.dropFrameMs;
  return {
    mode,
    fps: `${Math.min(...fps)}–${Math.max(...fps)}`,
    dragMaxFrame: `${Math.max(...drops.map((d) => d.dragFrameMs.max))} ms`,
    dropLongest: `${drop[0]} ms first, ${Math.min(...drop.slice(1))}–${Math.max(...drop.slice(1))} ms after`,
    answer: drops.every((d) => d.answerMs !== null)
      ? `${Math.min(...drops.map((d) => d.answerMs!))}–${Math.max(...drops.map((d) => d.answerMs!))} ms`
      : '—',
    loaf: `${Math.max(...drops.map((d) => d.longestLoafMs))} ms`,
    target: ok ? '✓' : '✗',
  };
}

async function main() {
  buildIfNeeded(log);
  const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-bench-layout-'));
  log(
    `Layout bench frames, ${os.cpus().length} cores, load average ${os
      .loadavg()
      .map((n) => n.toFixed(1))
      .join(' ')}; data in ${dataDir}`,
  );
  await seed(dataDir);
  const { child, url } = startServer(dataDir, args.port);
  let browser: Browser | null = null;
  try {
    await waitForHealth(url);
    browser = await chromium.launch({
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      headless: true,
      args: [
        '--no-sandbox',
        '--disable-gpu',
        '--disable-quic',
        '--no-first-run',
        '--disable-background-networking',
        '--disable-component-update',
        '--disable-sync',
      ],
    });
    const setup = await browser.newContext({ viewport: { width: 1440, height: 900 } });
    const page = await setup.newPage();
    await signIn(page, url);
    const plan = await makePlan(page, url);
    const storage = await setup.storageState();
    await setup.close();
    const results: Record<string, DropFigures[]> = {};
    for (const mode of args.modes) {
      log(`Measuring ${args.drops} drops with the check ${mode === 'worker' ? 'in its worker' : 'on the main thread'}…`);
      results[mode] = await runMode(browser, url, plan, mode, storage);
    }
    log('');
    log(
      `| live check | drag fps (≥ ${TARGET.fps}) | longest frame in the drag | longest frame on the drop (≤ ${TARGET.dropFrameMs} ms) | drop → answer | longest animation frame | target |`,
    );
    log('|---|---|---|---|---|---|---|');
    for (const mode of args.modes) {
      const s = summary(mode, results[mode]);
      log(
        `| ${mode === 'worker' ? 'in its worker' : 'on the main thread'} | ${s.fps} | ${s.dragMaxFrame} | ${s.dropLongest} | ${s.answer} | ${s.loaf} | ${s.target} |`,
      );
    }
    log(
      `\nLoad average after: ${os
        .loadavg()
        .map((n) => n.toFixed(1))
        .join(' ')}`,
    );
    if (args.write) {
      fs.mkdirSync('bench/results', { recursive: true });
      const file = `bench/results/layout-${new Date().toISOString().replace(/[:.]/g, '-')}.json`;
      fs.writeFileSync(
        file,
        JSON.stringify(
          {
            measuredAt: new Date().toISOString(),
            browser: 'Chromium headless, --disable-gpu',
            parts: 340,
            moves: MOVES,
            loadavg: os.loadavg(),
            results,
          },
          null,
          2,
        ),
      );
      log(`Written to ${file}`);
    }
  } finally {
    await browser?.close();
    if (child.pid) {
      try {
        process.kill(-child.pid, 'SIGTERM');
      } catch {
        // already gone
      }
    }
    await new Promise((r) => setTimeout(r, 1000));
    if (!args.keep) fs.rmSync(dataDir, { recursive: true, force: true });
  }
}

main().catch((e) => {
  console.error(e);
  process.exit(1);
});
