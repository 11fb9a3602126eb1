/**
 * The low-stock digest's scheduler in one server process (started beside the mail sender from
 * db/server-start.ts): every minute (KERFWISE_DIGEST_POLL_MS) it runs a round; the database decides who sends.
 * KERFWISE_LOW_STOCK_DIGEST=off leaves it stopped (the end-to-end harness does, so other specs see only their mail).
 */
import type { Db } from '@/db/open';
import { runLowStockDigests } from '@/db/queries/low-stock-digest';
import { log } from '@/server/log';
import { wakeMailSender } from '@/server/mail/service';

const holder = globalThis as typeof globalThis & { __kerfwiseDigest?: { timer: NodeJS.Timeout; running: Promise<void> | null } };

export function startDigestScheduler(db: Db, everyMs = Number(process.env.KERFWISE_DIGEST_POLL_MS) || 60_000): void {
  if (holder.__kerfwiseDigest || process.env.KERFWISE_LOW_STOCK_DIGEST === 'off') return;
  const state: { timer: NodeJS.Timeout; running: Promise<void> | null } = { timer: undefined as never, running: null };
  const round = () => {
    if (state.running) return;
    state.running = runLowStockDigests(db)
      .then((done) => {
        if (done.some((d) => d.mails > 0)) wakeMailSender();
        for (const d of done) log().info({ shopId: d.shopId, day: d.day, sizes: d.sizes, mails: d.mails }, 'low-stock digest');
      })
      .catch((error) => log().error({ err: error }, 'low-stock digest round failed'))
      .finally(() => {
        state.running = null;
      });
  };
  state.timer = setInterval(round, everyMs);
  state.timer.unref();
  holder.__kerfwiseDigest = state;
  round();
}

export async function stopDigestScheduler(): Promise<void> {
  const state = holder.__kerfwiseDigest;
  holder.__kerfwiseDigest = undefined;
  if (!state) return;
  clearInterval(state.timer);
  await state.running;
}
