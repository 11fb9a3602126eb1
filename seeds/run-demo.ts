/**
 * `npm run demo`: prepares ./data (secret, embedded database, migrations, demo shop), builds, and serves on :3000.
 * The embedded database is closed before the server starts, so the lock passes to the server. With no SMTP_URL,
 * a local mail catcher on 127.0.0.1 stores every mail the app sends in ./data/mail (the owner reads them on the
 * Sent mail page), and with no STRIPE_SECRET_KEY a local payments fake takes deposits on a test checkout page;
 * nothing leaves the machine.
 */
import { spawn, spawnSync } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { openDatabase } from '@/db/open';
import { startMailCatcher } from '@/lib/mail/catcher';
import { newWebhookSecret } from '@/lib/payments/config';
import { startPaymentsFake } from '@/lib/payments/fake';
import { DEMO_PASSWORD, DEMO_PEOPLE, seedDemoShop } from './demo-shop';

const dataDir = path.resolve(process.env.KERFWISE_DATA_DIR ?? './data');
const port = process.env.PORT ?? '3000';

function demoSecret(): string {
  const file = path.join(dataDir, 'demo-secret');
  if (!fs.existsSync(file)) {
    fs.mkdirSync(dataDir, { recursive: true });
    fs.writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  }
  return fs.readFileSync(file, 'utf8').trim();
}

async function prepareDatabase() {
  const handle = await openDatabase({ url: process.env.DATABASE_URL, dataDir: path.join(dataDir, 'pglite') });
  try {
    const { seeded } = await seedDemoShop(handle.db);
    console.log(seeded ? 'Seeded the demo shop.' : 'The database already has a shop: left as it is.');
  } finally {
    await handle.close();
  }
}

async function main() {
  const env = {
    ...process.env,
    NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET || demoSecret(),
    NEXTAUTH_URL: process.env.NEXTAUTH_URL || `http://localhost:${port}`,
    KERFWISE_DATA_DIR: dataDir,
    NEXT_TELEMETRY_DISABLED: '1',
  };
  await prepareDatabase();
  if (!process.env.SMTP_URL) {
    const catcher = await startMailCatcher({ dir: path.join(dataDir, 'mail') });
    Object.assign(env, { KERFWISE_MAIL_CATCHER_URL: catcher.url });
    console.log(`Mail: no SMTP_URL, so every mail is caught at ${catcher.url} and stored in ${catcher.dir} (Sent mail page).`);
  }
  if (!process.env.STRIPE_SECRET_KEY) {
    const webhookSecret = newWebhookSecret();
    const fake = await startPaymentsFake({ webhookUrl: `${env.NEXTAUTH_URL}/api/payments/webhook`, webhookSecret });
    Object.assign(env, { KERFWISE_PAYMENTS_URL: fake.url, KERFWISE_PAYMENTS_WEBHOOK_SECRET: webhookSecret });
    console.log(
      `Payments: no STRIPE_SECRET_KEY, so deposits are paid on a local test checkout at ${fake.url} (test card 4242 4242 4242 4242; nothing is charged).`,
    );
  }
  if (!process.argv.includes('--no-build')) {
    const build = spawnSync('npx', ['next', 'build'], { stdio: 'inherit', env });
    if (build.status !== 0) process.exit(build.status ?? 1);
  }
  console.log(`\nKerfwise demo on http://localhost:${port} — sign in as:`);
  for (const p of DEMO_PEOPLE) console.log(`  ${p.role.padEnd(9)} ${p.email}  /  ${DEMO_PASSWORD}`);
  const server = spawn('npx', ['next', 'start', '-p', port], { stdio: 'inherit', env });
  for (const signal of ['SIGINT', 'SIGTERM'] as const) process.on(signal, () => server.kill(signal));
  server.on('exit', (code) => process.exit(code ?? 0));
}

main().catch((error) => {
  console.error(error instanceof Error ? error.message : error);
  process.exit(1);
});
