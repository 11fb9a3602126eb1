/**
 * Client-side calls to Kerfwise's API, typed by the table of `shared/wire/api.ts`: JSON in and out, errors as
 * ApiError with field messages.
 */
import type { ApiBody, ApiQuery, ApiResponse, ApiRoute, Jsonified, PathParams } from '@/shared/wire/api';

export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string[]> = {},
    /** The whole answer, for refusals that carry details (a release's 409 lists the pieces that are gone). */
    readonly details: Record<string, unknown> = {},
  ) {
    super(message);
  }
}

/** What a call takes besides its key: path parameters (from the key), the body and the query the table names. */
export type CallInit<K extends ApiRoute> = (unknown extends PathParams<K> ? { params?: undefined } : { params: PathParams<K> }) &
  (ApiBody<K> extends undefined ? { body?: undefined } : { body: ApiBody<K> }) &
  (ApiQuery<K> extends undefined ? { query?: undefined } : { query?: ApiQuery<K> });

type CallArgs<K extends ApiRoute> = object extends CallInit<K> ? [init?: CallInit<K>] : [init: CallInit<K>];

/** What a route answers, as it arrives through JSON. */
export type Answer<K extends ApiRoute> = Jsonified<ApiResponse<K>>;

/**
 * One route of the table: `call('PATCH /api/jobs/:id/parts/:partId', { params: { id, partId }, body })`. A 401 (the
 * session is gone) loads the sign-in page; any other refusal throws ApiError.
 */
export async function call<K extends ApiRoute>(key: K, ...[init]: CallArgs<K>): Promise<Answer<K>> {
  const { params, body, query } = (init ?? {}) as { params?: Record<string, string>; body?: unknown; query?: Record<string, unknown> };
  const res = await fetch(urlOf(key, params, query), {
    method: key.slice(0, key.indexOf(' ')),
    headers: body !== undefined ? { 'content-type': 'application/json' } : undefined,
    body: body !== undefined ? JSON.stringify(body) : undefined,
  });
  const data = await res.json().catch(() => ({}));
  if (!res.ok) {
    // The session is gone: a whole new page load, so nothing of the signed-in state stays in memory.
    // eslint-disable-next-line @next/next/no-location-assign-relative-destination
    if (res.status === 401) window.location.assign('/sign-in');
    throw new ApiError(res.status, data.error ?? `Request failed (${res.status}).`, data.fields, data);
  }
  return data as Answer<K>;
}

/** The key's path with its parameters filled in (each encoded), and the query's set values after `?`. */
export function urlOf(key: ApiRoute, params: Record<string, string> = {}, query: Record<string, unknown> = {}): string {
  const path = key.slice(key.indexOf(' ') + 1).replace(/:(\w+)/g, (_, name: string) => {
    const value = params[name];
    if (value === undefined) throw new Error(`${key}: no value for :${name}.`);
    return encodeURIComponent(value);
  });
  const search = new URLSearchParams();
  for (const [name, value] of Object.entries(query)) if (value !== undefined && value !== null && value !== '') search.set(name, String(value));
  const qs = search.toString();
  return qs ? `${path}?${qs}` : path;
}
