/**
 * The benchmarks' own app server: `next start` on loopback over a data directory they seeded, in its own process
 * group (stop it with `process.kill(-child.pid)`), with a fresh secret, no PostgreSQL and no SMTP server.
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';

const distDir = process.env.KERFWISE_DIST_DIR || '.next';

/** Builds the app first when there is no build in KERFWISE_DIST_DIR (default .next). */
export function buildIfNeeded(log: (line: string) => void = console.log): void {
  if (fs.existsSync(path.join(distDir, 'BUILD_ID'))) return;
  log(`No build in ${distDir}: building…`);
  const build = spawnSync(process.execPath, ['node_modules/next/dist/bin/next', 'build'], {
    stdio: 'inherit',
    env: { ...process.env, NEXT_TELEMETRY_DISABLED: '1' },
  });
  if (build.status !== 0) throw new Error('next build failed');
}

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
