/**
 * The benchmarks' own app server: `next start` on loopback over a data directory they seeded, in its own process
 * group (stop it with `process.kill(-child.pid)`), with a fresh secret, no PostgreSQL and no SMTP server.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

export function startServer(dataDir: string, port: number): { child: ChildProcess; url: string } {
  const url = `http://127.0.0.1:${port}`;
  const out = fs.openSync(path.join(dataDir, 'server.log'), 'a');
  const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    detached: true,
    stdio: ['ignore', out, out],
    env: {
      ...process.env,
      NODE_ENV: 'production',
      NEXTAUTH_SECRET: randomBytes(32).toString('base64url'),
      NEXTAUTH_URL: url,
      KERFWISE_DATA_DIR: dataDir,
      DATABASE_URL: '',
      SMTP_URL: '',
      NEXT_TELEMETRY_DISABLED: '1',
    },
  });
  return { child, url };
}

/** Waits until the server answers /api/health, or fails after `seconds`. */
export async function waitForHealth(url: string, seconds = 90): Promise<void> {
  const until = Date.now() + seconds * 1000;
  while (Date.now() < until) {
    try {
      if ((await fetch(`${url}/api/health`)).ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error(`the server did not answer /api/health within ${seconds} s`);
}
