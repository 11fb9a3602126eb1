import 'server-only';
import { NextResponse, type NextRequest } from 'next/server';
import { z, type ZodType } from 'zod';
import { getDb } from '@/db/client';
import type { Db } from '@/db/open';
import { userFromRequest, type SessionUser } from '@/lib/auth/session';
import { can, type Permission } from '@/lib/auth/permissions';
import { forbidden, HttpError, notFound, toErrorResponse, unauthorized } from './errors';

export interface RouteContext<P, B, Q, U = SessionUser> {
  req: NextRequest;
  db: Db;
  user: U;
  params: P;
  body: B;
  query: Q;
}

/** Routes for people who cannot sign in yet (accepting an invite, resetting a forgotten password). */
export const ANYONE = 'anyone';

interface RouteSpec<P, B, Q> {
  /** What the caller must be allowed; `ANYONE` for the few public routes (signed in or not: `user` may be null). */
  permission: Permission | typeof ANYONE;
  /** Path parameters; a value that does not parse (say, not a uuid) is a 404, not a 422. */
  params?: ZodType<P>;
  body?: ZodType<B>;
  query?: ZodType<Q>;
  /** Status of a successful response (201 for creations). */
  status?: number;
}

type NextRouteContext = { params: Promise<Record<string, string | string[]>> };

const MAX_BODY_BYTES = 2_000_000;

/**
 * Every API route handler is built with this: authenticate → check the permission → parse params, query and body
 * with zod → act → respond. The proxy only redirects pages; this is where access is decided.
 */
export function route<P = undefined, B = undefined, Q = undefined>(
  spec: RouteSpec<P, B, Q> & { permission: typeof ANYONE },
  handler: (ctx: RouteContext<P, B, Q, SessionUser | null>) => Promise<unknown>,
): (req: NextRequest, context: NextRouteContext) => Promise<Response>;
export function route<P = undefined, B = undefined, Q = undefined>(
  spec: RouteSpec<P, B, Q> & { permission: Permission },
  handler: (ctx: RouteContext<P, B, Q>) => Promise<unknown>,
): (req: NextRequest, context: NextRouteContext) => Promise<Response>;
export function route<P = undefined, B = undefined, Q = undefined>(
  spec: RouteSpec<P, B, Q>,
  handler: (ctx: RouteContext<P, B, Q, never>) => Promise<unknown>,
) {
  return async (req: NextRequest, context: NextRouteContext): Promise<Response> => {
    try {
      const db = await getDb();
      const user = await userFromRequest(req, db);
      if (spec.permission !== ANYONE) {
        if (!user) throw unauthorized();
        if (!can(user.role, spec.permission)) throw forbidden();
      }

      let params = undefined as P;
      if (spec.params) {
        const parsed = spec.params.safeParse(await context.params);
        if (!parsed.success) throw notFound();
        params = parsed.data;
      }
      const query = (spec.query ? spec.query.parse(Object.fromEntries(req.nextUrl.searchParams)) : undefined) as Q;
      const body = (spec.body ? spec.body.parse(await readJson(req)) : undefined) as B;

      const result = await handler({ req, db, user: user as never, params, body, query });
      if (result instanceof Response) return result;
      return NextResponse.json(result ?? { ok: true }, { status: spec.status ?? 200 });
    } catch (error) {
      const { status, body } = toErrorResponse(error);
      return NextResponse.json(body, { status });
    }
  };
}

async function readJson(req: NextRequest): Promise<unknown> {
  const length = Number(req.headers.get('content-length') ?? 0);
  if (length > MAX_BODY_BYTES) throw new HttpError(413, 'That request is too large.');
  const text = await req.text();
  if (text.length > MAX_BODY_BYTES) throw new HttpError(413, 'That request is too large.');
  if (!text) return {};
  try {
    return JSON.parse(text);
  } catch {
    throw new HttpError(422, 'The request body is not valid JSON.');
  }
}

export const idParams = z.object({ id: z.uuid() });
