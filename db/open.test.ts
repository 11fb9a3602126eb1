import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { spawnSync } from 'node:child_process';
import { acquireDirectoryLock } from './lock';

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
    expect(fs.readFileSync(lock, 'utf8')).toBe(String(process.pid));
    release();
    expect(fs.existsSync(lock)).toBe(false);
  });
});
