/** Client-side fetch for Kerfwise's API: JSON in and out, errors as ApiError with field messages. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    message: string,
    readonly fields: Record<string, string[]> = {},
  ) {
    super(message);
  }
}

export async function api<T>(url: string, init: { method?: string; body?: unknown } = {}): Promise<T> {
  const res = await fetch(url, {
    method: init.method ?? 'GET',
    headers: init.body !== undefined ? { 'content-type': 'application/json' } : undefined,
    body: init.body !== undefined ? JSON.stringify(init.body) : undefined,
  });
  const data = await res.json().catch(() => ({}));
  if (!res.ok) {
    // The session is gone: a whole new page load, so nothing of the signed-in state stays in memory.
    // eslint-disable-next-line @next/next/no-location-assign-relative-destination
    if (res.status === 401) window.location.assign('/sign-in');
    throw new ApiError(res.status, data.error ?? `Request failed (${res.status}).`, data.fields);
  }
  return data as T;
}
