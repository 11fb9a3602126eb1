/**
 * Backing up the embedded database while the server runs. PGlite is one process's database: nothing else may open
 * its directory, and copying the files from outside could catch a page half written. So the process that holds it
 * makes the dump itself, on request over a Unix socket beside the directory (`<dir>.sock`, mode 0600: only the
 * account that runs the server, which can read the data directory anyway, may connect; it listens on no network).
 *
 * The dump is PGlite's own `dumpDataDir`, which runs between queries (it holds PGlite's query lock), after a
 * CHECKPOINT; a transaction still open at that moment is not in it, as after a crash: the restored copy has every
 * transaction committed before the dump, whole, and nothing of the rest.
 *
 * Protocol: the client sends `dump\n`; the server answers `ok <bytes>\n` and that many bytes of gzipped tar, or
 * `error <message>\n`.
 */
import fs from 'node:fs';
import net from 'node:net';

/** Longest path a Unix socket takes on Linux (108 bytes with the terminating NUL). */
const MAX_SOCKET_PATH = 107;

export const backupSocketPath = (dataDir: string) => `${dataDir}.sock`;

export interface LiveBackupServer {
  path: string;
  close(): Promise<void>;
}

/**
 * Listens for dump requests for the database in `dataDir`, answered by `dump`. Call only while holding the
 * directory's lock (a leftover socket file of a process killed before is removed). `{ error }`, saying why, when
 * the socket's path is too long for the system.
 */
export async function serveLiveBackups(dataDir: string, dump: () => Promise<Blob>): Promise<LiveBackupServer | { error: string }> {
  const socketPath = backupSocketPath(dataDir);
  if (Buffer.byteLength(socketPath) > MAX_SOCKET_PATH) {
    return {
      error: `Backups while the server runs are off: the socket path ${socketPath} is longer than ${MAX_SOCKET_PATH} bytes (use a shorter KERFWISE_DATA_DIR).`,
    };
  }
  fs.rmSync(socketPath, { force: true });
  const server = net.createServer((socket) => {
    let asked = '';
    socket.on('error', () => socket.destroy());
    socket.on('data', async (chunk) => {
      asked += chunk.toString('utf8');
      if (!asked.includes('\n')) {
        if (asked.length > 64) socket.destroy();
        return;
      }
      socket.removeAllListeners('data');
      if (asked.trim() !== 'dump') {
        socket.end('error unknown request\n');
        return;
      }
      try {
        const bytes = Buffer.from(await (await dump()).arrayBuffer());
        socket.write(`ok ${bytes.length}\n`);
        socket.end(bytes);
      } catch (error) {
        socket.end(`error ${String((error as Error).message).replace(/\n/g, ' ')}\n`);
      }
    });
  });
  // Owner-only from the moment it exists: no window in which another account could connect.
  const umask = process.umask(0o177);
  try {
    await new Promise<void>((resolve, reject) => {
      server.once('error', reject);
      server.listen(socketPath, () => resolve());
    });
  } finally {
    process.umask(umask);
  }
  fs.chmodSync(socketPath, 0o600);
  return {
    path: socketPath,
    close: () =>
      new Promise<void>((resolve) => {
        server.close(() => resolve());
        fs.rmSync(socketPath, { force: true });
      }),
  };
}

/**
 * Asks the process serving `dataDir` for a dump. Null when no process answers on its socket (there is none, or it
 * is a leftover of one that is gone); throws when one answers with an error.
 */
export async function requestLiveDump(dataDir: string, timeoutMs = 120_000): Promise<Buffer | null> {
  const socketPath = backupSocketPath(dataDir);
  if (!fs.existsSync(socketPath)) return null;
  return new Promise<Buffer | null>((resolve, reject) => {
    const socket = net.connect(socketPath);
    const chunks: Buffer[] = [];
    let connected = false;
    const timer = setTimeout(() => {
      socket.destroy();
      reject(new Error(`The server did not send the backup within ${timeoutMs / 1000} s.`));
    }, timeoutMs);
    socket.on('connect', () => {
      connected = true;
      socket.write('dump\n');
    });
    socket.on('data', (c) => chunks.push(c));
    socket.on('error', (error: NodeJS.ErrnoException) => {
      clearTimeout(timer);
      if (!connected && (error.code === 'ECONNREFUSED' || error.code === 'ENOENT')) resolve(null);
      else reject(error);
    });
    socket.on('end', () => {
      clearTimeout(timer);
      const all = Buffer.concat(chunks);
      const eol = all.indexOf(0x0a);
      const head = all.subarray(0, eol < 0 ? all.length : eol).toString('utf8');
      const ok = /^ok (\d+)$/.exec(head);
      if (!ok) return reject(new Error(`The server could not make the backup: ${head.replace(/^error /, '') || 'no answer'}`));
      const body = all.subarray(eol + 1);
      if (body.length !== Number(ok[1]))
        return reject(new Error(`The backup was cut short (${body.length} of ${ok[1]} bytes): nothing was written.`));
      resolve(body);
    });
  });
}
