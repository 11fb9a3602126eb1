/**
 * `npm test`: the whole suite, in order, stopping at the first failing stage.
 *   1. type check (tsc)                     4. next build
 *   2. unit, property and integration       5. end-to-end in Debian's Chromium
 *      tests on in-memory PGlite (vitest)   6. one totals line; any skipped test fails the run
 *   3. the database integration tests again on a PostgreSQL server started here on loopback
 * Debian's chromium and postgresql are installed when missing and we are root; otherwise it stops with the
 * one command to run. Nothing else is downloaded.
 */
import { spawnSync, type SpawnSyncOptions } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import os from 'node:os';
import path from 'node:path';

const OUT = path.resolve('test-results');
const isRoot = process.getuid?.() === 0;
const totals = { passed: 0, failed: 0, skipped: 0 };

function run(title: string, cmd: string, args: string[], options: Omit<SpawnSyncOptions, 'env'> & { env?: Record<string, string> } = {}) {
  console.log(`\n▶ ${title}`);
  const res = spawnSync(cmd, args, { stdio: 'inherit', ...options, env: { ...process.env, ...options.env } });
  return res.status ?? 1;
}

function fail(message: string): never {
  console.error(`\n✖ ${message}`);
  printTotals();
  process.exit(1);
}

function printTotals() {
  console.log(`\nTotal: ${totals.passed} passed, ${totals.failed} failed, ${totals.skipped} skipped`);
}

function ensureDebianPackage(pkg: string, present: () => boolean) {
  if (present()) return;
  if (!isRoot) fail(`${pkg} is missing: run \`sudo apt-get install -y ${pkg}\`, then npm test again.`);
  console.log(`\n▶ installing Debian's ${pkg}`);
  spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
  const res = spawnSync('apt-get', ['install', '-y', '-qq', pkg], { stdio: 'inherit', env: { ...process.env, DEBIAN_FRONTEND: 'noninteractive' } });
  if (res.status !== 0 || !present()) fail(`Could not install ${pkg}: run \`apt-get install -y ${pkg}\` by hand.`);
}

function postgresBin(): string | null {
  const root = '/usr/lib/postgresql';
  if (!fs.existsSync(root)) return null;
  const versions = fs
    .readdirSync(root)
    .filter((v) => fs.existsSync(path.join(root, v, 'bin/pg_ctl')))
    .sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(root, versions[0], 'bin') : null;
}

function addVitest(file: string) {
  const r = JSON.parse(fs.readFileSync(file, 'utf8'));
  totals.passed += r.numPassedTests;
  // A file that fails before any test runs (a missing fixture, an import error) has no failed test to count.
  const brokenFiles = (r.testResults as { status: string; assertionResults: unknown[] }[]).filter(
    (f) => f.status === 'failed' && f.assertionResults.length === 0,
  );
  totals.failed += r.numFailedTests + brokenFiles.length;
  totals.skipped += r.numPendingTests + r.numTodoTests;
}

function addPlaywright(file: string) {
  const s = JSON.parse(fs.readFileSync(file, 'utf8')).stats;
  totals.passed += s.expected + s.flaky;
  totals.failed += s.unexpected;
  totals.skipped += s.skipped;
}

function vitest(title: string, file: string, args: string[], env: Record<string, string> = {}) {
  fs.rmSync(file, { force: true });
  const status = run(title, 'npx', ['vitest', 'run', ...args, '--reporter=default', '--reporter=json', `--outputFile.json=${file}`], { env });
  if (fs.existsSync(file)) addVitest(file);
  if (status !== 0) fail(`${title} failed.`);
}

/** A loopback port nobody listens on now, as the system hands it out. */
function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = net.createServer();
    server.on('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as net.AddressInfo;
      server.close(() => resolve(port));
    });
  });
}

/** A throw-away PostgreSQL cluster on 127.0.0.1, owned by the postgres user when we are root. */
async function withPostgres(body: (url: string) => void) {
  const bin = postgresBin()!;
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'kerfwise-pg-'));
  const port = String(await freePort());
  const asPg = (cmd: string, args: string[]) =>
    isRoot
      ? spawnSync('runuser', ['-u', 'postgres', '--', path.join(bin, cmd), ...args], { stdio: 'inherit' })
      : spawnSync(path.join(bin, cmd), args, { stdio: 'inherit' });
  if (isRoot) spawnSync('chown', ['postgres:postgres', dir]);
  const data = path.join(dir, 'data');
  if (asPg('initdb', ['-D', data, '-U', 'postgres', '--auth=trust', '--no-sync', '-E', 'UTF8']).status !== 0) fail('initdb failed.');
  const opts = `-p ${port} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off -c max_connections=200`;
  if (asPg('pg_ctl', ['-D', data, '-o', opts, '-l', path.join(dir, 'server.log'), '-w', 'start']).status !== 0) fail('PostgreSQL did not start.');
  try {
    body(`postgres://postgres@127.0.0.1:${port}/postgres`);
  } finally {
    asPg('pg_ctl', ['-D', data, '-m', 'fast', '-w', 'stop']);
    fs.rmSync(dir, { recursive: true, force: true });
  }
}

fs.mkdirSync(OUT, { recursive: true });
ensureDebianPackage('chromium', () => fs.existsSync(process.env.CHROMIUM_PATH ?? '/usr/bin/chromium'));
ensureDebianPackage('postgresql', () => postgresBin() !== null);
// The quote PDF's test reads the PDF back with poppler's pdftotext.
ensureDebianPackage('poppler-utils', () => fs.existsSync('/usr/bin/pdftotext'));

if (run('type check', 'npx', ['tsc', '--noEmit', '-p', '.']) !== 0) fail('Type check failed.');
vitest('unit, property and integration tests (embedded PGlite)', path.join(OUT, 'vitest.json'), []);
await withPostgres((url) =>
  vitest('database integration tests on PostgreSQL', path.join(OUT, 'vitest-postgres.json'), ['tests/integration'], { TEST_DATABASE_URL: url }),
);
if (run('production build', 'npx', ['next', 'build'], { env: { NEXT_TELEMETRY_DISABLED: '1' } }) !== 0) fail('next build failed.');

const e2eJson = path.join(OUT, 'playwright.json');
fs.rmSync(e2eJson, { force: true });
const e2e = run('end-to-end tests in Chromium', 'npx', ['playwright', 'test', '--reporter=list,json'], {
  env: { PLAYWRIGHT_JSON_OUTPUT_NAME: e2eJson },
});
if (fs.existsSync(e2eJson)) addPlaywright(e2eJson);
if (e2e !== 0) fail('End-to-end tests failed (screenshots in test-results/).');

if (totals.skipped > 0) fail(`${totals.skipped} test(s) were skipped: a run that skips tests is not green.`);
if (totals.passed === 0) fail('No test ran.');
printTotals();
