import { spawn } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { describe, expect, test } from 'vitest';
import { openDatabase } from '@/db/open';

describe('the embedded database directory', () => {
  test('is refused to a second process while the first holds it, naming the holder, and free again after', async () => {
    const dir = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'kw-db-')), 'pglite');
    const holder = spawn(process.execPath, ['--import', 'tsx', 'tests/support/hold-database.ts', dir], { stdio: ['pipe', 'pipe', 'inherit'] });
    await new Promise<void>((resolve, reject) => {
      holder.stdout.on('data', (d) => String(d).includes('ready') && resolve());
      holder.on('exit', (code) => reject(new Error(`holder exited early (${code})`)));
    });

    await expect(openDatabase({ dataDir: dir })).rejects.toThrow(`in use by process ${holder.pid}`);

    holder.stdin.end();
    await new Promise((resolve) => holder.on('exit', resolve));
    const reopened = await openDatabase({ dataDir: dir });
    expect(reopened.kind).toBe('pglite');
    await reopened.close();
  });
});
