import fs from 'node:fs';

/**
 * PGlite has no lock of its own: two processes on one data directory silently lose data. This takes an exclusive
 * lock file beside the directory holding our pid; a lock left by a dead process is taken over.
 */
export function acquireDirectoryLock(lockPath: string): () => void {
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const fd = fs.openSync(lockPath, 'wx');
      fs.writeSync(fd, String(process.pid));
      fs.closeSync(fd);
      let released = false;
      const release = () => {
        if (released) return;
        released = true;
        try {
          if (readHolder(lockPath) === process.pid) fs.unlinkSync(lockPath);
        } catch {
          // Already gone: nothing to release.
        }
      };
      process.once('exit', release);
      return release;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = readHolder(lockPath);
      if (holder !== null && holder !== process.pid && isAlive(holder)) {
        throw new Error(
          `The database directory is in use by process ${holder} (lock file ${lockPath}). ` +
            'Stop that process first: two processes on one embedded database lose data.',
        );
      }
      // Stale (dead holder, unreadable, or our own from a previous open in this process): take it over.
      fs.rmSync(lockPath, { force: true });
    }
  }
  throw new Error(`Could not take the database lock ${lockPath}.`);
}

function readHolder(lockPath: string): number | null {
  try {
    const pid = Number.parseInt(fs.readFileSync(lockPath, 'utf8').trim(), 10);
    return Number.isInteger(pid) && pid > 0 ? pid : null;
  } catch {
    return null;
  }
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}
