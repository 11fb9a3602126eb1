/**
 * The security headers of every answer (pages through proxy.ts, API routes through the route wrapper, static files
 * through next.config.mjs). Pure, so the policy can be tested as text.
 */

/**
 * The Content-Security-Policy of a page, with the request's own nonce. Next.js puts the nonce on its scripts (it
 * reads it from this header on the request); 'strict-dynamic' lets those load the chunks they need. The nesting
 * engine runs in a Web Worker from our own origin (a blob: URL in development); konva draws on canvas and exports
 * data: and blob: images; fonts ship with the app.
 */
export function contentSecurityPolicy(nonce: string, { development = false }: { development?: boolean } = {}): string {
  return [
    "default-src 'self'",
    // Development's fast refresh evaluates code; production never does.
    `script-src 'self' 'nonce-${nonce}' 'strict-dynamic'${development ? " 'unsafe-eval'" : ''}`,
    `style-src 'self' 'nonce-${nonce}'`,
    // React sets style attributes in the markup it renders (widths of bars, positions on the bench): attributes only,
    // never a <style> element or a stylesheet from elsewhere.
    "style-src-attr 'unsafe-inline'",
    "img-src 'self' data: blob:",
    "font-src 'self'",
    "connect-src 'self'",
    "worker-src 'self' blob:",
    "manifest-src 'self'",
    "media-src 'self'",
    "object-src 'none'",
    "base-uri 'self'",
    "form-action 'self'",
    "frame-ancestors 'none'",
  ].join('; ');
}

/** True when the request reached us over https (directly, or through a proxy that says so). */
export function isHttps(req: { url: string; headers: Pick<Headers, 'get'> }): boolean {
  const forwarded = req.headers.get('x-forwarded-proto')?.split(',')[0].trim().toLowerCase();
  if (forwarded) return forwarded === 'https';
  return new URL(req.url).protocol === 'https:';
}

/** Headers for every answer, page or API; HSTS only where the request came over https. */
export function securityHeaders(https: boolean): Record<string, string> {
  return {
    'X-Content-Type-Options': 'nosniff',
    'Referrer-Policy': 'strict-origin-when-cross-origin',
    'X-Frame-Options': 'DENY',
    // Nothing in Kerfwise uses a camera, microphone, location, payment or USB; the cutter's screen may go full.
    'Permissions-Policy': 'camera=(), microphone=(), geolocation=(), payment=(), usb=(), interest-cohort=(), browsing-topics=()',
    'Cross-Origin-Opener-Policy': 'same-origin',
    ...(https ? { 'Strict-Transport-Security': 'max-age=31536000; includeSubDomains' } : {}),
  };
}

/** A fresh, unguessable nonce for one page request. */
export function newNonce(): string {
  const bytes = new Uint8Array(16);
  crypto.getRandomValues(bytes);
  return btoa(String.fromCharCode(...bytes));
}
