/**
 * Reads the `.eml` files the local mail catcher stored (the Sent mail page, the tests), parsed with `postal-mime`
 * into what a recipient's mail program shows: sender, recipients, subject, the plain-text and HTML parts, and the
 * attachments.
 */
import fs from 'node:fs';
import path from 'node:path';
import PostalMime from 'postal-mime';

export interface CaughtMail {
  /** The file's name (without folder): stable, and safe to put in a URL. */
  id: string;
  messageId: string | null;
  from: string;
  to: string[];
  subject: string;
  date: string | null;
  text: string | null;
  html: string | null;
  attachments: { filename: string | null; contentType: string; size: number }[];
  /** Headers a reader may want to check (List-Unsubscribe, Auto-Submitted…), lower-case keys. */
  headers: Record<string, string>;
}

const EML = /^[\w.-]+\.eml$/;

/** The stored messages' file names, newest first. */
export function caughtMailIds(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return fs
    .readdirSync(dir)
    .filter((f) => EML.test(f))
    .sort()
    .reverse();
}

export async function readCaughtMail(dir: string, id: string): Promise<CaughtMail | null> {
  if (!EML.test(id)) return null;
  const file = path.join(dir, id);
  if (!fs.existsSync(file)) return null;
  const parsed = await PostalMime.parse(fs.readFileSync(file));
  const address = (a: { name?: string; address?: string } | undefined) => (a ? (a.name ? `${a.name} <${a.address}>` : (a.address ?? '')) : '');
  return {
    id,
    messageId: parsed.messageId ?? null,
    from: address(parsed.from as { name?: string; address?: string } | undefined),
    to: (parsed.to ?? []).map((a) => address(a as { name?: string; address?: string })),
    subject: parsed.subject ?? '',
    date: parsed.date ?? null,
    text: parsed.text ?? null,
    html: parsed.html ?? null,
    attachments: parsed.attachments.map((a) => ({
      filename: a.filename,
      contentType: a.mimeType,
      size: typeof a.content === 'string' ? a.content.length : a.content.byteLength,
    })),
    headers: Object.fromEntries(parsed.headers.map((h) => [h.key.toLowerCase(), h.value])),
  };
}

/** Every stored message, newest first (at most `limit`). */
export async function listCaughtMail(dir: string, limit = 200): Promise<CaughtMail[]> {
  const out: CaughtMail[] = [];
  for (const id of caughtMailIds(dir).slice(0, limit)) {
    const mail = await readCaughtMail(dir, id);
    if (mail) out.push(mail);
  }
  return out;
}
