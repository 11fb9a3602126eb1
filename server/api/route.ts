import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import { z, type ZodType } from 'zod';
import { getDbHandle } from '@/db/client';
import type { Db } from '@/db/open';
import { scopeOf, type Scope } from '@/db/scope';
import { userFromRequest, type SessionUser } from '@/server/auth/session';
import { can, type Permission } from '@/lib/auth/permissions';
import { forbidden, notFound, setErrorReporter, toErrorResponse, unauthorized } from './errors';
import { checkJsonBody, checkSameOrigin, readJsonBody, readTextBody } from './request-guard';
import { withoutPrices } from '@/lib/stock/without-prices';
import { isHttps, securityHeaders } from '@/lib/security-headers';
import { log, requestIdOf, routeOf } from '@/server/log';

export interface RouteContext<P, B, Q, U = SessionUser> {
  req: NextRequest;
  /** The body as text, read within the size limit: only for `signedByService` routes (the signature covers the bytes). */
  rawBody: string;
  db: Db;
  user: U;
  /** The database, the user's shop and the user, for `db/queries` (a public route's signed-out caller has none). */
  scope: U extends SessionUser ? Scope : Scope | null;
  params: P;
  body: B;
  query: Q;
}

/** Routes for people who cannot sign in yet (accepting an invite, resetting a forgotten password). */
export const ANYONE = 'anyone';

interface RouteSpec<P, B, Q, BI = B, QI = Q> {
  /** What the caller must be allowed; `ANYONE` for the few public routes (signed in or not: `user` may be null). */
  permission: Permission | typeof ANYONE;
  /** Path parameters; a value that does not parse (say, not a uuid) is a 404, not a 422. */
  params?: ZodType<P>;
  body?: ZodType<B, BI>;
  query?: ZodType<Q, QI>;
  /** Status of a successful response (201 for creations). */
  status?: number;
  /**
   * A call from another service that signs what it sends (the payments webhook): it comes from no browser, so the
   * same-origin and JSON-type checks do not apply; the handler must check the signature on `rawBody` first.
   */
  signedByService?: true;
}

setErrorReporter((error, requestId) => log().error({ err: error, requestId }, 'unexpected error'));

type NextRouteContext = { params: Promise<Record<string, string | string[]>> };

declare const wire: unique symbol;

/**
 * What `route()` gives Next.js: the request handler, carrying (as a type only, nothing at run time) what it answers
 * and what it reads, so `tests/house-rules/api-contract.ts` holds it to the table of `shared/wire/api.ts`.
 * `Result` is the handler's resolved value, `Body` and `Query` what the zod schemas accept (`z.input`).
 */
export type RouteHandler<Result, Body = undefined, Query = undefined> = ((req: NextRequest, context: NextRouteContext) => Promise<Response>) & {
  readonly [wire]?: { result: Result; body: Body; query: Query };
};

/** What a route answers in JSON: its handler's value, `{ ok: true }` for none; a `Response` it builds is not JSON. */
export type RouteResult<H> = H extends RouteHandler<infer R, unknown, unknown> ? JsonAnswer<Exclude<R, Response>> : never;
/** What a route's body schema accepts (`undefined` for none). */
export type RouteBody<H> = H extends { readonly [wire]?: { body: infer B } } ? B : never;
/** What a route's query schema accepts (`undefined` for none). */
export type RouteQuery<H> = H extends { readonly [wire]?: { query: infer Q } } ? Q : never;
type JsonAnswer<R> = [R] extends [never] ? never : R extends null | undefined | void ? { ok: true } : R;

/**
 * Every API route handler is built with this: authenticate → check the permission → parse params, query and body
 * with zod → act → respond. The proxy only redirects pages; this is where access is decided. Before anything
 * else, a state-changing request must come from the app's own pages (403) and carry JSON if it has a body (415).
 */
export function route<R, P = undefined, B = undefined, Q = undefined, BI = undefined, QI = undefined>(
  spec: RouteSpec<P, B, Q, BI, QI> & { permission: typeof ANYONE },
  handler: (ctx: RouteContext<P, B, Q, SessionUser | null>) => Promise<R>,
): RouteHandler<R, BI, QI>;
export function route<R, P = undefined, B = undefined, Q = undefined, BI = undefined, QI = undefined>(
  spec: RouteSpec<P, B, Q, BI, QI> & { permission: Permission },
  handler: (ctx: RouteContext<P, B, Q>) => Promise<R>,
): RouteHandler<R, BI, QI>;
export function route<P = undefined, B = undefined, Q = undefined>(
  spec: RouteSpec<P, B, Q, unknown, unknown>,
  handler: (ctx: RouteContext<P, B, Q, never>) => Promise<unknown>,
) {
  return async (req: NextRequest, context: NextRouteContext): Promise<Response> => {
    const started = performance.now();
    const requestId = requestIdOf(req.headers);
    const who: { user?: SessionUser } = {};
    const res = await handle(req, context, who, requestId);
    for (const [k, v] of Object.entries(securityHeaders(isHttps(req)))) if (!res.headers.has(k)) res.headers.set(k, v);
    res.headers.set('X-Request-Id', requestId);
    logRequest(req, res, requestId, started, who.user);
    return res;
  };

  async function handle(req: NextRequest, context: NextRouteContext, who: { user?: SessionUser }, requestId: string): Promise<Response> {
    try {
      if (!spec.signedByService) {
        checkSameOrigin(req);
        checkJsonBody(req);
      }
      const handle = await getDbHandle();
      const db = handle.db;
      const user = await userFromRequest(req, handle);
      if (spec.permission !== ANYONE) {
        if (!user) throw unauthorized();
        if (!can(user.role, spec.permission)) throw forbidden();
      }
      if (user) who.user = user;

      let params = undefined as P;
      if (spec.params) {
        const parsed = spec.params.safeParse(await context.params);
        if (!parsed.success) throw notFound();
        params = parsed.data;
      }
      const query = (spec.query ? spec.query.parse(Object.fromEntries(req.nextUrl.searchParams)) : undefined) as Q;
      const rawBody = spec.signedByService ? await readTextBody(req) : '';
      const body = (spec.body ? spec.body.parse(await readJsonBody(req)) : undefined) as B;

      const scope = user ? scopeOf(db, user) : null;
      const result = await handler({ req, rawBody, db, user: user as never, scope: scope as never, params, body, query });
      if (result instanceof Response) return result;
      // A role that may not see prices gets none, whatever the handler returned (a write's echo included).
      const shown = user && !can(user.role, 'prices:read') ? withoutPrices(result) : result;
      return NextResponse.json(shown ?? { ok: true }, { status: spec.status ?? 200 });
    } catch (error) {
      const { status, body, headers } = toErrorResponse(error, requestId);
      return NextResponse.json(body, { status, headers });
    }
  }
}

/** One line per request: who and what, never a body, a header or a cookie. */
function logRequest(req: NextRequest, res: Response, requestId: string, started: number, user: SessionUser | undefined) {
  log().info(
    {
      requestId,
      method: req.method,
      route: routeOf(req.nextUrl.pathname),
      status: res.status,
      ms: Math.round((performance.now() - started) * 10) / 10,
      shopId: user?.shopId ?? null,
      userId: user?.id ?? null,
    },
    'api request',
  );
}

export const idParams = z.object({ id: z.uuid() });
