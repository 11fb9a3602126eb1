/**
 * More than one app server on one PostgreSQL, for end-to-end tests: a throw-away PostgreSQL cluster on loopback
 * (started the way tests/run-all.ts starts one, as the postgres user when we are root) and `next start` processes
 * on it, each in its own process group.
 */
import { spawn, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

const isRoot = process.getuid?.() === 0;

function postgresBin(): string {
  const root = '/usr/lib/postgresql';
  const versions = fs.existsSync(root)
    ? fs
        .readdirSync(root)
        .filter((v) => fs.existsSync(path.join(root, v, 'bin/pg_ctl')))
        .sort((a, b) => Number(b) - Number(a))
    : [];
  if (!versions.length) throw new Error("Debian's postgresql is not installed: run `apt-get install -y postgresql`.");
  return path.join(root, versions[0], 'bin');
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

export interface Cluster {
  url: string;
  stop(): void;
}

export async function startPostgres(): Promise<Cluster> {
  const bin = postgresBin();
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-pg-'));
  const port = String(await freePort());
  const asPg = (cmd: string, args: string[]) =>
    isRoot
      ? spawnSync('runuser', ['-u', 'postgres', '--', path.join(bin, cmd), ...args], { stdio: 'pipe' })
      : spawnSync(path.join(bin, cmd), args, { stdio: 'pipe' });
  if (isRoot) spawnSync('chown', ['postgres:postgres', dir]);
  const data = path.join(dir, 'data');
  const init = asPg('initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '--no-sync', '-E', 'UTF8']);
  if (init.status !== 0) throw new Error(`initdb failed: ${init.stderr}`);
  const opts = `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=100`;
  const start = asPg('pg_ctl', ['-D', data, '-o', opts, '-l', path.join(dir, 'server.log'), '-w', 'start']);
  if (start.status !== 0) throw new Error(`PostgreSQL did not start: ${start.stderr}`);
  return {
    url: `postgres://postgres@127.0.0.1:${port}/postgres`,
    stop() {
      asPg('pg_ctl', ['-D', data, '-m', 'fast', '-w', 'stop']);
      fs.rmSync(dir, { recursive: true, force: true });
    },
  };
}

export interface AppServer {
  url: string;
  stop(): Promise<void>;
}

/** `next start` of this checkout's build on `port`, on the database at `databaseUrl`. */
export async function startAppServer(port: number, env: Record<string, string>): Promise<AppServer> {
  const url = `http://127.0.0.1:${port}`;
  const logFile = path.join(os.tmpdir(), `kerfwise-app-${port}.log`);
  const log = fs.openSync(logFile, 'w');
  const child = spawn(process.execPath, ['node_modules/next/dist/bin/next', 'start', '-p', String(port), '-H', '127.0.0.1'], {
    detached: true,
    stdio: ['ignore', log, log],
    env: { ...process.env, NODE_ENV: 'production', NEXTAUTH_URL: url, NEXT_TELEMETRY_DISABLED: '1', ...env },
  });
  child.unref();
  const until = Date.now() + 60_000;
  for (;;) {
    try {
      if ((await fetch(`${url}/api/health`)).status === 200) break;
    } catch {
      // not listening yet
    }
    if (Date.now() > until) throw new Error(`next start on ${port} did not answer /api/health (see ${logFile})`);
    await new Promise((r) => setTimeout(r, 200));
  }
  return {
    url,
    async stop() {
      try {
        process.kill(-child.pid!, 'SIGTERM');
      } catch {
        return;
      }
      for (let i = 0; i < 50; i++) {
        try {
          process.kill(-child.pid!, 0);
        } catch {
          return;
        }
        await new Promise((r) => setTimeout(r, 200));
      }
      try {
        process.kill(-child.pid!, 'SIGKILL');
      } catch {
        // gone
      }
    },
  };
}
