import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { spawnSync } from 'node:child_process';
import { spawn } from 'node:child_process';
import { acquireDirectoryLock, currentHolder, readHolder } from './lock';

describe('the embedded database lock', () => {
  test('a second holder is refused with the first holder named', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-lock-'));
    const lock = path.join(dir, 'pglite.lock');
    // A live process other than us holds the lock: our parent shell's pid stands in for another server.
    fs.writeFileSync(lock, String(process.ppid));
    expect(() => acquireDirectoryLock(lock)).toThrow(new RegExp(`in use by process ${process.ppid}`));
    expect(fs.readFileSync(lock, 'utf8')).toBe(String(process.ppid));
  });

  test('a lock left by a dead process is taken over and released', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-lock-'));
    const lock = path.join(dir, 'pglite.lock');
    const dead = spawnSync(process.execPath, ['-e', 'process.stdout.write(String(process.pid))']).stdout.toString();
    fs.writeFileSync(lock, dead);
    const release = acquireDirectoryLock(lock);
    expect(readHolder(lock)?.pid).toBe(process.pid);
    release();
    expect(fs.existsSync(lock)).toBe(false);
  });

  test('the lock names its holder by pid, start time and boot id', () => {
    const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kw-lock-'));
    const lock = path.join(dir, 'pglite.lock');
    const release = acquireDirectoryLock(lock);
    const holder = readHolder(lock)!;
    expect(holder).toEqual(currentHolder());
    expect(holder.startTime).toMatch(/^\d+$/);
    expect(holder.bootId).toMatch(/^[0-9a-f-]{36}$/);
    release();
  });

  describe('a lock whose pid now belongs to another process (a kill -9, then the pid reused) is taken over', () => {
    // A live process that did not write the lock: a child of ours, sleeping.
    const withLiveStranger = async (body: (pid: number, me: ReturnType<typeof currentHolder>) => void) => {
      const child = spawn(process.execPath, ['-e', 'setTimeout(() => {}, 30000)'], { stdio: 'ignore' });
      await new Promise((r) => child.once('spawn', r));
      try {
        body(child.pid!, currentHolder());
      } finally {
        child.kill();
      }
    };

    test('same boot, another start time', async () => {
      await withLiveStranger((pid, me) => {
        const lock = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'kw-lock-')), 'pglite.lock');
        fs.writeFileSync(lock, JSON.stringify({ pid, startTime: '1', bootId: me.bootId }));
        const release = acquireDirectoryLock(lock);
        expect(readHolder(lock)?.pid).toBe(process.pid);
        release();
      });
    });

    test('another boot (the lock survived a reboot)', async () => {
      await withLiveStranger((pid) => {
        const lock = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'kw-lock-')), 'pglite.lock');
        const startTime = fs.readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ')[19];
        fs.writeFileSync(lock, JSON.stringify({ pid, startTime, bootId: '00000000-0000-4000-8000-000000000000' }));
        const release = acquireDirectoryLock(lock);
        expect(readHolder(lock)?.pid).toBe(process.pid);
        release();
      });
    });

    test('but the real holder (same pid, start time and boot) keeps it', async () => {
      await withLiveStranger((pid, me) => {
        const lock = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'kw-lock-')), 'pglite.lock');
        const startTime = fs.readFileSync(`/proc/${pid}/stat`, 'utf8').split(') ')[1].split(' ')[19];
        fs.writeFileSync(lock, JSON.stringify({ pid, startTime, bootId: me.bootId }));
        expect(() => acquireDirectoryLock(lock)).toThrow(new RegExp(`in use by process ${pid}`));
      });
    });
  });
});
