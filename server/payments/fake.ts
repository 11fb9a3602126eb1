/**
 * A local stand-in for the hosted payments service, so the demo and the tests take deposits with no account
 * anywhere. It answers the few API calls the app makes through the service's Node SDK (make a checkout session,
 * read it back, expire it, refund a payment), serves a test checkout page where a test card pays or is declined,
 * redirects back to the app, and posts webhook events signed the way the hosted service signs them (the SDK's own
 * test signer: `t=<unix time>,v1=<HMAC-SHA256 of "t.payload">`).
 *
 * Test cards (the hosted service's published test numbers): 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is
 * declined. Nothing is ever charged: this is a test page on 127.0.0.1.
 */
import { randomBytes } from 'node:crypto';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import Stripe from 'stripe';
import { FAKE_SECRET_KEY } from '@/lib/payments/config';

export const TEST_CARD_PAYS = '4242424242424242';
export const TEST_CARD_DECLINED = '4000000000000002';

interface FakeSession {
  id: string;
  object: 'checkout.session';
  mode: 'payment';
  status: 'open' | 'complete' | 'expired';
  payment_status: 'unpaid' | 'paid';
  amount_total: number;
  currency: string;
  client_reference_id: string | null;
  customer_email: string | null;
  metadata: Record<string, string>;
  payment_intent: string | null;
  success_url: string;
  cancel_url: string;
  url: string | null;
  created: number;
  expires_at: number;
  livemode: false;
  /** The line's name, shown on the checkout page (not part of the session object the SDK returns). */
  description: string;
}

export interface FakeDelivery {
  type: string;
  eventId: string;
  status: number | null;
}

export interface PaymentsFake {
  url: string;
  /** Every webhook delivery attempt, in order (the tests read it). */
  deliveries: FakeDelivery[];
  close(): Promise<void>;
}

const now = () => Math.floor(Date.now() / 1000);
const id = (prefix: string) => `${prefix}_test_${randomBytes(12).toString('hex')}`;
const escape = (s: string) => s.replace(/[&<>"']/g, (c) => ({ '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;' })[c]!);

function apiError(res: http.ServerResponse, status: number, message: string, type = 'invalid_request_error') {
  res.writeHead(status, { 'content-type': 'application/json' });
  res.end(JSON.stringify({ error: { type, message } }));
}

function json(res: http.ServerResponse, body: unknown) {
  res.writeHead(200, { 'content-type': 'application/json' });
  res.end(JSON.stringify(body));
}

async function readBody(req: http.IncomingMessage): Promise<URLSearchParams> {
  let body = '';
  for await (const chunk of req) {
    body += chunk;
    if (body.length > 100_000) throw new Error('body too large');
  }
  return new URLSearchParams(body);
}

/** The session as the SDK returns it (without the fake's own fields). */
function publicSession(s: FakeSession) {
  const { description: _d, ...session } = s;
  return session;
}

function money(minor: number, currency: string): string {
  const format = new Intl.NumberFormat('en-US', { style: 'currency', currency: currency.toUpperCase() });
  return format.format(minor / 10 ** (format.resolvedOptions().maximumFractionDigits ?? 2));
}

function checkoutPage(s: FakeSession, message: { text: string; tone: 'bad' | 'note' } | null): string {
  const colour = message?.tone === 'bad' ? '#a33' : '#555';
  return `<!doctype html>
<html lang="en"><head><meta charset="utf-8"><meta name="viewport" content="width=device-width, initial-scale=1">
<title>Test checkout</title>
<style>
body{margin:0;font-family:system-ui,-apple-system,'Segoe UI',sans-serif;background:#f3f4f6;color:#1f2937}
main{max-width:420px;margin:0 auto;padding:24px 16px}
.card{background:#fff;border:1px solid #d1d5db;border-radius:10px;padding:20px}
.badge{display:inline-block;font-size:12px;background:#fde68a;border-radius:4px;padding:2px 6px;margin-bottom:12px}
h1{font-size:18px;margin:0 0 4px}.amount{font-size:28px;font-weight:600;margin:8px 0 16px}
label{display:block;font-size:14px;margin:12px 0 4px}input{width:100%;box-sizing:border-box;font-size:16px;padding:10px;border:1px solid #9ca3af;border-radius:6px}
button{margin-top:16px;width:100%;font-size:16px;padding:12px;border:0;border-radius:6px;background:#1f2937;color:#fff;cursor:pointer}
.msg{margin-top:12px;font-size:14px;color:${colour}}.small{font-size:13px;color:#6b7280;margin-top:16px}a{color:#1f2937}
</style></head>
<body><main><div class="card">
<span class="badge">Test mode · no card is charged</span>
<h1>${escape(s.description)}</h1>
<div class="amount" data-testid="checkout-amount">${escape(money(s.amount_total, s.currency))}</div>
${
  s.status === 'open'
    ? `<form method="post" action="/checkout/${escape(s.id)}">
<label for="card">Card number</label>
<input id="card" name="card" inputmode="numeric" autocomplete="cc-number" placeholder="4242 4242 4242 4242" required>
<button type="submit">Pay ${escape(money(s.amount_total, s.currency))}</button>
</form>`
    : `<p class="msg">This checkout is ${s.status === 'complete' ? 'paid' : 'closed'}.</p>`
}
${message ? `<p class="msg" role="alert">${escape(message.text)}</p>` : ''}
<p class="small">Test cards: 4242 4242 4242 4242 pays; 4000 0000 0000 0002 is declined.</p>
<p class="small"><a href="${escape(s.cancel_url)}">Cancel and go back</a></p>
</div></main></body></html>`;
}

/** What the fake holds while it runs: its sessions, the events it sent, and where the app listens for them. */
interface FakeState {
  sessions: Map<string, FakeSession>;
  deliveries: FakeDelivery[];
  signer: Stripe;
  webhookUrl: string;
  webhookSecret: string;
  /** The fake's own address, once it listens (checkout pages link to it). */
  base: string;
}

/** `unref`: the fake does not keep the process alive by itself (when a server process starts its own). */
export async function startPaymentsFake(options: {
  webhookUrl: string;
  webhookSecret: string;
  port?: number;
  unref?: boolean;
}): Promise<PaymentsFake> {
  const state: FakeState = {
    sessions: new Map(),
    deliveries: [],
    signer: new Stripe(FAKE_SECRET_KEY),
    webhookUrl: options.webhookUrl,
    webhookSecret: options.webhookSecret,
    base: '',
  };
  const server = http.createServer((req, res) => route(state, req, res));
  await new Promise<void>((resolve) => server.listen(options.port ?? 0, '127.0.0.1', resolve));
  if (options.unref) server.unref();
  state.base = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
  return {
    url: state.base,
    deliveries: state.deliveries,
    close: () => new Promise<void>((resolve) => server.close(() => resolve())),
  };
}

/** A request to the fake: a checkout page, the API (`/v1/…`), or nothing it knows. */
function route(state: FakeState, req: http.IncomingMessage, res: http.ServerResponse) {
  const path = new URL(req.url ?? '/', 'http://fake').pathname;
  if (path === '/favicon.ico') {
    res.writeHead(204);
    return res.end();
  }
  const page = /^\/checkout\/([\w-]+)$/.exec(path);
  const work = page
    ? checkout(state, req, res, page[1])
    : path.startsWith('/v1/')
      ? api(state, req, res, path)
      : Promise.resolve(apiError(res, 404, 'Not found.'));
  work.catch((error: unknown) => {
    if (!res.headersSent) apiError(res, 500, error instanceof Error ? error.message : 'Fake failed.', 'api_error');
    else res.end();
  });
}

/** Posts an event to the app, signed; retried a few times with backoff like the hosted service (shortened). */
async function deliver(state: FakeState, type: string, object: unknown): Promise<void> {
  const event = { id: id('evt'), object: 'event', api_version: Stripe.API_VERSION, created: now(), livemode: false, type, data: { object } };
  const payload = JSON.stringify(event);
  for (let attempt = 0; attempt < 4; attempt++) {
    const header = state.signer.webhooks.generateTestHeaderString({ payload, secret: state.webhookSecret });
    let status: number | null = null;
    try {
      const res = await fetch(state.webhookUrl, {
        method: 'POST',
        headers: { 'content-type': 'application/json', 'stripe-signature': header },
        body: payload,
        signal: AbortSignal.timeout(15_000),
      });
      status = res.status;
      await res.body?.cancel();
    } catch {
      status = null;
    }
    state.deliveries.push({ type, eventId: event.id, status });
    if (status !== null && status >= 200 && status < 300) return;
    await new Promise((r) => setTimeout(r, 250 * 2 ** attempt));
  }
}

/** The API the SDK calls: create, read and expire checkout sessions, refund a payment. */
async function api(state: FakeState, req: http.IncomingMessage, res: http.ServerResponse, path: string) {
  if (req.headers.authorization !== `Bearer ${FAKE_SECRET_KEY}`) return apiError(res, 401, 'Invalid API key provided.', 'authentication_error');
  if (req.method === 'POST' && path === '/v1/checkout/sessions') return createSession(state, res, await readBody(req));
  const read = /^\/v1\/checkout\/sessions\/([\w-]+)$/.exec(path);
  if (req.method === 'GET' && read) {
    const s = state.sessions.get(read[1]);
    return s ? json(res, publicSession(s)) : apiError(res, 404, `No such checkout.session: '${read[1]}'`);
  }
  const expire = /^\/v1\/checkout\/sessions\/([\w-]+)\/expire$/.exec(path);
  if (req.method === 'POST' && expire) return expireSession(state, res, expire[1]);
  if (req.method === 'POST' && path === '/v1/refunds') return refund(state, res, await readBody(req));
  apiError(res, 404, `Unrecognized request URL (${req.method}: ${path}).`);
}

/** A payment-mode checkout session for one line, open for a day. */
function createSession(state: FakeState, res: http.ServerResponse, f: URLSearchParams) {
  const unit = Number(f.get('line_items[0][price_data][unit_amount]'));
  const quantity = Number(f.get('line_items[0][quantity]') ?? '1');
  const currency = f.get('line_items[0][price_data][currency]') ?? '';
  if (f.get('mode') !== 'payment') return apiError(res, 400, 'The fake takes payment-mode sessions only.');
  if (!Number.isSafeInteger(unit) || unit < 1 || !Number.isSafeInteger(quantity) || quantity < 1) return apiError(res, 400, 'Invalid amount.');
  if (!/^[a-z]{3}$/.test(currency)) return apiError(res, 400, 'Invalid currency.');
  const successUrl = f.get('success_url');
  const cancelUrl = f.get('cancel_url');
  if (!successUrl || !cancelUrl) return apiError(res, 400, 'success_url and cancel_url are required.');
  const metadata: Record<string, string> = {};
  for (const [k, v] of f) {
    const m = /^metadata\[(.+)\]$/.exec(k);
    if (m) metadata[m[1]] = v;
  }
  const sid = id('cs');
  const session: FakeSession = {
    id: sid,
    object: 'checkout.session',
    mode: 'payment',
    status: 'open',
    payment_status: 'unpaid',
    amount_total: unit * quantity,
    currency,
    client_reference_id: f.get('client_reference_id'),
    customer_email: f.get('customer_email'),
    metadata,
    payment_intent: null,
    success_url: successUrl,
    cancel_url: cancelUrl,
    url: `${state.base}/checkout/${sid}`,
    created: now(),
    expires_at: now() + 24 * 3600,
    livemode: false,
    description: f.get('line_items[0][price_data][product_data][name]') ?? 'Payment',
  };
  state.sessions.set(sid, session);
  return json(res, publicSession(session));
}

async function expireSession(state: FakeState, res: http.ServerResponse, sid: string) {
  const s = state.sessions.get(sid);
  if (!s) return apiError(res, 404, `No such checkout.session: '${sid}'`);
  if (s.status !== 'open') return apiError(res, 400, 'Only an open session can be expired.');
  s.status = 'expired';
  s.url = null;
  // The event goes before the answer (the hosted service sends it on its own time), so a test sees it applied.
  await deliver(state, 'checkout.session.expired', publicSession(s));
  return json(res, publicSession(s));
}

/** A refund of a paid session's payment (all of it, or `amount`), and the charge.refunded event. */
async function refund(state: FakeState, res: http.ServerResponse, f: URLSearchParams) {
  const intent = f.get('payment_intent');
  const s = [...state.sessions.values()].find((x) => x.payment_intent !== null && x.payment_intent === intent);
  if (!s) return apiError(res, 404, `No such payment_intent: '${intent}'`);
  const amount = f.has('amount') ? Number(f.get('amount')) : s.amount_total;
  const refunded = { id: id('re'), object: 'refund', amount, currency: s.currency, payment_intent: intent, status: 'succeeded' };
  const charge = {
    id: id('ch'),
    object: 'charge',
    amount: s.amount_total,
    amount_refunded: amount,
    currency: s.currency,
    payment_intent: intent,
    refunded: amount >= s.amount_total,
  };
  await deliver(state, 'charge.refunded', charge);
  return json(res, refunded);
}

/** The hosted checkout page: the form, and the test cards' outcomes (paid → event, then back to the app). */
async function checkout(state: FakeState, req: http.IncomingMessage, res: http.ServerResponse, sid: string) {
  const s = state.sessions.get(sid);
  if (!s) {
    res.writeHead(404, { 'content-type': 'text/plain; charset=utf-8' });
    return res.end('No such checkout.');
  }
  const page = (status: number, message: Parameters<typeof checkoutPage>[1]) => {
    res.writeHead(status, { 'content-type': 'text/html; charset=utf-8', 'cache-control': 'no-store' });
    res.end(checkoutPage(s, message));
  };
  if (req.method !== 'POST') return page(200, null);
  if (s.status !== 'open') return page(409, { text: 'This checkout is no longer open.', tone: 'bad' });
  const card = ((await readBody(req)).get('card') ?? '').replace(/[\s-]/g, '');
  if (card === TEST_CARD_DECLINED) return page(200, { text: 'Your card was declined. Nothing was charged; try another card.', tone: 'bad' });
  if (card !== TEST_CARD_PAYS) return page(200, { text: 'This is a test checkout: use the test card 4242 4242 4242 4242.', tone: 'bad' });
  s.status = 'complete';
  s.payment_status = 'paid';
  s.payment_intent = id('pi');
  s.url = null;
  // The hosted service sends the event and redirects independently; here the event goes first, so a test that
  // follows the redirect finds it delivered (the app copes with either order).
  await deliver(state, 'checkout.session.completed', publicSession(s));
  res.writeHead(303, { location: s.success_url.replace('{CHECKOUT_SESSION_ID}', s.id) });
  res.end();
}
