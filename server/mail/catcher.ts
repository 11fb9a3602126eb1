/**
 * The local SMTP catcher: a tiny SMTP server on 127.0.0.1 (built on `smtp-server`) that accepts every message and
 * stores it, exactly as received, as an `.eml` file in one folder (`<data dir>/mail/`). The demo, the end-to-end
 * harness and the integration tests start it when no real SMTP_URL is configured; the Sent mail page reads the folder.
 * It never relays anything anywhere.
 */
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';
import type { AddressInfo } from 'node:net';
import path from 'node:path';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';

export interface MailCatcher {
  /** `smtp://127.0.0.1:<port>` — hand it to nodemailer. */
  readonly url: string;
  readonly port: number;
  /** The folder the `.eml` files land in. */
  readonly dir: string;
  /**
   * Tests: answer every following message with this SMTP status instead of accepting it (a 5xx is a permanent
   * refusal, a 4xx a temporary one), or accept again with `null`.
   */
  refuseWith(code: number | null, message?: string): void;
  close(): Promise<void>;
}

export interface CatcherOptions {
  dir: string;
  /** 0 (the default) takes a free port; a restart can ask for the port it had. */
  port?: number;
  /** Tests: runs once a message is stored, before the sender hears it was accepted. */
  onStored?: (file: string) => void;
}

/** One stored message per file, named so that a plain sort is the order they arrived in. */
function fileName(): string {
  return `${new Date().toISOString().replace(/[:.]/g, '-')}-${randomBytes(4).toString('hex')}.eml`;
}

export async function startMailCatcher({ dir, port = 0, onStored }: CatcherOptions): Promise<MailCatcher> {
  const folder = path.resolve(dir);
  fs.mkdirSync(folder, { recursive: true });
  let refusal: { code: number; message: string } | null = null;

  const server = new SMTPServer({
    name: 'kerfwise-mail-catcher',
    banner: 'Kerfwise mail catcher (stores messages locally, delivers nothing)',
    authOptional: true,
    disabledCommands: ['STARTTLS', 'AUTH'],
    size: 30 * 1024 * 1024,
    logger: false,
    onData(stream: SMTPServerDataStream, _session: SMTPServerSession, callback: (error?: Error | null) => void) {
      const chunks: Buffer[] = [];
      stream.on('data', (chunk: Buffer) => chunks.push(chunk));
      stream.on('error', (error) => callback(error));
      stream.on('end', () => {
        if (refusal) {
          const error = Object.assign(new Error(refusal.message), { responseCode: refusal.code });
          return callback(error);
        }
        if (stream.sizeExceeded) return callback(Object.assign(new Error('Message too large'), { responseCode: 552 }));
        try {
          const name = fileName();
          const tmp = path.join(folder, `.${name}.part`);
          fs.writeFileSync(tmp, Buffer.concat(chunks));
          fs.renameSync(tmp, path.join(folder, name));
          onStored?.(path.join(folder, name));
          callback();
        } catch (error) {
          callback(Object.assign(error as Error, { responseCode: 451 }));
        }
      });
    },
  });

  await new Promise<void>((resolve, reject) => {
    server.once('error', reject);
    server.listen(port, '127.0.0.1', () => {
      server.off('error', reject);
      resolve();
    });
  });
  // A client that goes away mid-conversation must not take the process down.
  server.on('error', (error) => console.error(`Mail catcher: ${error.message}`));
  const actual = (server.server.address() as AddressInfo).port;

  return {
    url: `smtp://127.0.0.1:${actual}`,
    port: actual,
    dir: folder,
    refuseWith(code, message = code && code >= 500 ? 'Mailbox unavailable' : 'Try again later') {
      refusal = code === null ? null : { code, message };
    },
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}
