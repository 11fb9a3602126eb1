import fs from 'node:fs';

/**
 * PGlite has no lock of its own: two processes on one data directory silently lose data. This takes an exclusive
 * lock file beside the directory naming its holder: the pid, the holder's start time (as the kernel counts it, in
 * clock ticks since boot) and the machine's boot id. A lock is taken over when its holder is gone: the pid is dead,
 * or it now belongs to another process (a different start time, or another boot: after a crash and a reboot the pid
 * is often reused by something else).
 */
export interface LockHolder {
  pid: number;
  /** Field 22 of /proc/<pid>/stat; null where there is no /proc. */
  startTime: string | null;
  /** /proc/sys/kernel/random/boot_id; null where there is none. */
  bootId: string | null;
}

export function acquireDirectoryLock(lockPath: string): () => void {
  const me = currentHolder();
  for (let attempt = 0; attempt < 3; attempt++) {
    try {
      const fd = fs.openSync(lockPath, 'wx');
      fs.writeSync(fd, JSON.stringify(me));
      fs.closeSync(fd);
      let released = false;
      const release = () => {
        if (released) return;
        released = true;
        try {
          if (readHolder(lockPath)?.pid === process.pid) fs.unlinkSync(lockPath);
        } catch {
          // Already gone: nothing to release.
        }
      };
      process.once('exit', release);
      return release;
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const holder = readHolder(lockPath);
      if (holder !== null && holder.pid !== process.pid && holdsNow(holder)) {
        throw new Error(
          `The database directory is in use by process ${holder.pid} (lock file ${lockPath}). ` +
            'Stop that process first: two processes on one embedded database lose data.',
        );
      }
      // Stale (holder gone or its pid reused, unreadable, or our own from a previous open in this process).
      fs.rmSync(lockPath, { force: true });
    }
  }
  throw new Error(`Could not take the database lock ${lockPath}.`);
}

export function currentHolder(): LockHolder {
  return { pid: process.pid, startTime: startTimeOf(process.pid), bootId: bootId() };
}

/** The lock file's holder; a lock from before start times were recorded holds a bare pid. */
export function readHolder(lockPath: string): LockHolder | null {
  let text: string;
  try {
    text = fs.readFileSync(lockPath, 'utf8').trim();
  } catch {
    return null;
  }
  if (/^\d+$/.test(text)) return { pid: Number(text), startTime: null, bootId: null };
  try {
    const v = JSON.parse(text) as Partial<LockHolder>;
    if (!Number.isInteger(v.pid) || (v.pid as number) <= 0) return null;
    return {
      pid: v.pid as number,
      startTime: typeof v.startTime === 'string' ? v.startTime : null,
      bootId: typeof v.bootId === 'string' ? v.bootId : null,
    };
  } catch {
    return null;
  }
}

/** True when the process that wrote the lock is still running (not just some process with its pid). */
export function holdsNow(holder: LockHolder): boolean {
  if (!isAlive(holder.pid)) return false;
  const boot = bootId();
  if (holder.bootId && boot && holder.bootId !== boot) return false;
  const started = startTimeOf(holder.pid);
  if (holder.startTime && started && holder.startTime !== started) return false;
  return true;
}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

function startTimeOf(pid: number): string | null {
  try {
    const stat = fs.readFileSync(`/proc/${pid}/stat`, 'utf8');
    // The command name (field 2) may hold spaces and parentheses: count fields after its closing one.
    return stat.slice(stat.lastIndexOf(')') + 2).split(' ')[19] ?? null;
  } catch {
    return null;
  }
}

function bootId(): string | null {
  try {
    return fs.readFileSync('/proc/sys/kernel/random/boot_id', 'utf8').trim() || null;
  } catch {
    return null;
  }
}
