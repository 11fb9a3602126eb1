/**
 * Starts and stops the built app (`next start`) for end-to-end tests on its own port and data directory.
 * The server runs in its own process group so stopping it also stops next-server; its pid lives in a file so
 * any Playwright process (setup, a test, teardown) can restart it.
 */
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

export const E2E_PORT = Number(process.env.E2E_PORT ?? 3107);
export const E2E_URL = `http://127.0.0.1:${E2E_PORT}`;
export const E2E_DIR = path.resolve(`test-results/e2e-server-${E2E_PORT}`);
export const E2E_DATA = path.join(E2E_DIR, 'data');
const PID_FILE = path.join(E2E_DIR, 'server.pid');
const SECRET_FILE = path.join(E2E_DIR, 'secret');
/** The mail catcher global setup started (its URL), so a restarted server sends to the same one. */
export const MAIL_CATCHER_FILE = path.join(E2E_DIR, 'mail-catcher-url');
/** Where the catcher stores the `.eml` files (the data directory's `mail/`, as in the demo). */
export const E2E_MAIL = path.join(E2E_DATA, 'mail');
/** The payments fake global setup started (its URL and webhook secret, JSON). */
export const PAYMENTS_FILE = path.join(E2E_DIR, 'payments-fake.json');

function paymentsEnv(): Record<string, string> {
  const fake = fs.existsSync(PAYMENTS_FILE) ? (JSON.parse(fs.readFileSync(PAYMENTS_FILE, 'utf8')) as { url: string; webhookSecret: string }) : null;
  return {
    STRIPE_SECRET_KEY: '',
    STRIPE_WEBHOOK_SECRET: '',
    KERFWISE_PAYMENTS_URL: fake?.url ?? '',
    KERFWISE_PAYMENTS_WEBHOOK_SECRET: fake?.webhookSecret ?? '',
  };
}

function secret(): string {
  if (!fs.existsSync(SECRET_FILE)) fs.writeFileSync(SECRET_FILE, randomBytes(32).toString('base64url'));
  return fs.readFileSync(SECRET_FILE, 'utf8');
}

export async function startServer(extraEnv: Record<string, string> = {}): Promise<void> {
  fs.mkdirSync(E2E_DIR, { recursive: true });
  const log = fs.openSync(path.join(E2E_DIR, 'server.log'), 'a');
  const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(E2E_PORT), '-H', '127.0.0.1'], {
    detached: true,
    stdio: ['ignore', log, log],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      NEXTAUTH_SECRET: secret(),
      NEXTAUTH_URL: E2E_URL,
      KERFWISE_DATA_DIR: E2E_DATA,
      DATABASE_URL: '',
      SMTP_URL: '',
      KERFWISE_MAIL_CATCHER_URL: fs.existsSync(MAIL_CATCHER_FILE) ? fs.readFileSync(MAIL_CATCHER_FILE, 'utf8') : '',
      KERFWISE_MAIL_POLL_MS: '500',
      ...paymentsEnv(),
      // The low-stock digest would mail the demo's owner once the shop's clock passes 07:00: off, so specs that read
      // caught mail see only their own (the digest is tested in tests/integration/low-stock-digest.test.ts).
      KERFWISE_LOW_STOCK_DIGEST: 'off',
      NEXT_TELEMETRY_DISABLED: '1',
      ...extraEnv,
    },
  });
  child.unref();
  fs.writeFileSync(PID_FILE, String(child.pid));
  await waitFor(async () => (await health()) === 200, 60_000, 'the server to answer /api/health');
}

export async function stopServer(): Promise<void> {
  if (!fs.existsSync(PID_FILE)) return;
  const pid = Number(fs.readFileSync(PID_FILE, 'utf8'));
  fs.rmSync(PID_FILE);
  try {
    process.kill(-pid, 'SIGTERM');
  } catch {
    return; // already gone
  }
  const lock = path.join(E2E_DATA, 'pglite.lock');
  await waitFor(async () => !groupAlive(pid) && !fs.existsSync(lock), 20_000, 'the server to stop and release its database').catch(() => {
    try {
      process.kill(-pid, 'SIGKILL');
    } catch {
      // gone
    }
  });
}

/** The resident memory of the server's whole process group (next start and next-server), in bytes. */
export function serverRssBytes(): number {
  const pgid = Number(fs.readFileSync(PID_FILE, 'utf8'));
  let total = 0;
  for (const entry of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(entry)) continue;
    try {
      const stat = fs.readFileSync(`/proc/${entry}/stat`, 'utf8');
      // Fields after the command name (which may hold spaces): state ppid pgrp …; rss is field 24 (pages).
      const rest = stat.slice(stat.lastIndexOf(')') + 2).split(' ');
      if (Number(rest[2]) !== pgid) continue;
      total += Number(rest[21]) * 4096;
    } catch {
      // the process ended while we looked
    }
  }
  return total;
}

/** kill -9 of the whole server group, at once: no shutdown handler runs. */
export async function killServer(): Promise<void> {
  if (!fs.existsSync(PID_FILE)) return;
  const pid = Number(fs.readFileSync(PID_FILE, 'utf8'));
  fs.rmSync(PID_FILE);
  try {
    process.kill(-pid, 'SIGKILL');
  } catch {
    return;
  }
  await waitFor(async () => !groupAlive(pid), 10_000, 'the killed server to be gone');
}

async function health(): Promise<number> {
  try {
    return (await fetch(`${E2E_URL}/api/health`)).status;
  } catch {
    return 0;
  }
}

function groupAlive(pid: number): boolean {
  try {
    process.kill(-pid, 0);
    return true;
  } catch {
    return false;
  }
}

async function waitFor(check: () => Promise<boolean>, timeoutMs: number, what: string) {
  const until = Date.now() + timeoutMs;
  while (Date.now() < until) {
    if (await check()) return;
    await new Promise((r) => setTimeout(r, 200));
  }
  throw new Error(`Timed out waiting for ${what}.`);
}
