import { HttpError } from './errors';

/** Methods that change nothing; everything else must come from the app's own pages. */
const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

export const MAX_BODY_BYTES = 2_000_000;

/**
 * Refuses a state-changing request that another site made the browser send (cross-site request forgery). The
 * browser's `Origin` must be the app's own: the configured public address (NEXTAUTH_URL) or the host the request
 * came to. Where a browser sends no Origin, its `Sec-Fetch-Site` must say same-origin. A request with neither
 * is refused too: every browser we support sends at least one on a POST, PATCH, PUT or DELETE.
 */
export function checkSameOrigin(req: Request, publicUrl: string | undefined = process.env.NEXTAUTH_URL): void {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return;
  const origin = req.headers.get('origin');
  if (origin !== null) {
    if (!isOwnOrigin(origin, req, publicUrl)) throw new HttpError(403, 'This request came from another site, so it was refused.');
    return;
  }
  const site = req.headers.get('sec-fetch-site');
  if (site === 'same-origin') return;
  throw new HttpError(403, 'This request did not come from a Kerfwise page, so it was refused.');
}

function isOwnOrigin(origin: string, req: Request, publicUrl: string | undefined): boolean {
  let url: URL;
  try {
    url = new URL(origin);
  } catch {
    return false; // "null" (a sandboxed frame, a file) or garbage
  }
  if (publicUrl) {
    try {
      if (url.origin === new URL(publicUrl).origin) return true;
    } catch {
      // a malformed NEXTAUTH_URL matches nothing
    }
  }
  // The host the browser addressed (a proxy's forwarded host first), as Next.js checks server actions.
  const host = (req.headers.get('x-forwarded-host') ?? req.headers.get('host') ?? new URL(req.url).host).split(',')[0].trim().toLowerCase();
  return host !== '' && url.host.toLowerCase() === host;
}

/** True when the request says it carries a body (a length above zero, or chunked). */
function declaresBody(req: Request): boolean {
  const length = req.headers.get('content-length');
  if (length !== null) return Number(length) > 0;
  return req.headers.has('transfer-encoding');
}

/**
 * A body on a state-changing request must be JSON: a form or text/plain body (what a cross-site form can send
 * without asking) is a 415, as is a body with no type at all.
 */
export function checkJsonBody(req: Request): void {
  if (SAFE_METHODS.has(req.method.toUpperCase())) return;
  const header = req.headers.get('content-type');
  if (header === null && !declaresBody(req)) return;
  const type = (header ?? '').split(';')[0].trim().toLowerCase();
  if (type !== 'application/json') throw new HttpError(415, 'Send the request body as JSON (Content-Type: application/json).');
}

const tooLarge = () => new HttpError(413, `That request is too large (the limit is ${MAX_BODY_BYTES / 1_000_000} MB).`);

/**
 * The body as text, read as it streams in: the byte count stops the read at the limit, so a huge (or chunked,
 * length-less) body never sits in memory whole.
 */
export async function readTextBody(req: Request, limit = MAX_BODY_BYTES): Promise<string> {
  const declared = req.headers.get('content-length');
  if (declared !== null && Number(declared) > limit) throw tooLarge();
  if (!req.body) return '';
  const reader = req.body.getReader();
  const chunks: Uint8Array[] = [];
  let total = 0;
  for (;;) {
    const { done, value } = await reader.read();
    if (done) break;
    total += value.byteLength;
    if (total > limit) {
      await reader.cancel().catch(() => undefined);
      throw tooLarge();
    }
    chunks.push(value);
  }
  const bytes = new Uint8Array(total);
  let at = 0;
  for (const c of chunks) {
    bytes.set(c, at);
    at += c.byteLength;
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw new HttpError(422, 'The request body is not valid UTF-8 text.');
  }
}

/** The body as JSON (read as `readTextBody` reads it); an empty body is `{}`. */
export async function readJsonBody(req: Request, limit = MAX_BODY_BYTES): Promise<unknown> {
  const text = await readTextBody(req, limit);
  if (!text.trim()) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new HttpError(422, 'The request body is not valid JSON.');
  }
}
