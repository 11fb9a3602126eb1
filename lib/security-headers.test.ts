import { describe, expect, test } from 'vitest';
import { contentSecurityPolicy, isHttps, newNonce, securityHeaders } from './security-headers';

// Directive names and values as the W3C's Content Security Policy Level 3 defines them; header names and values
// from MDN's HTTP headers reference (X-Content-Type-Options, Referrer-Policy, Permissions-Policy,
// Strict-Transport-Security).
const directives = (csp: string) => Object.fromEntries(csp.split('; ').map((d) => [d.split(' ')[0], d.split(' ').slice(1)]));

describe('the page policy', () => {
  test('scripts only with the request nonce (and what they load), no eval in production, no framing', () => {
    const d = directives(contentSecurityPolicy('abc123=='));
    expect(d['script-src']).toEqual(["'self'", "'nonce-abc123=='", "'strict-dynamic'"]);
    expect(d['style-src']).toEqual(["'self'", "'nonce-abc123=='"]);
    expect(d['worker-src']).toEqual(["'self'", 'blob:']);
    expect(d['frame-ancestors']).toEqual(["'none'"]);
    expect(d['object-src']).toEqual(["'none'"]);
    expect(contentSecurityPolicy('n')).not.toMatch(/unsafe-eval/);
    expect(contentSecurityPolicy('n', { development: true })).toMatch(/script-src [^;]*'unsafe-eval'/);
  });

  test('every nonce is new: 1,000 in a row, no repeat, 16 random bytes each', () => {
    const seen = new Set(Array.from({ length: 1000 }, newNonce));
    expect(seen.size).toBe(1000);
    for (const n of [...seen].slice(0, 5)) expect(atob(n)).toHaveLength(16);
  });
});

describe('headers on every answer', () => {
  test('nosniff, a referrer policy and a permissions policy; HSTS only over https', () => {
    const plain = securityHeaders(false);
    expect(plain['X-Content-Type-Options']).toBe('nosniff');
    expect(plain['Referrer-Policy']).toBe('strict-origin-when-cross-origin');
    expect(plain['Permissions-Policy']).toMatch(/camera=\(\)/);
    expect(plain['Strict-Transport-Security']).toBeUndefined();
    expect(securityHeaders(true)['Strict-Transport-Security']).toBe('max-age=31536000; includeSubDomains');
  });

  test('https is read from the URL or from the proxy in front', () => {
    const h = (v?: string) => new Headers(v ? { 'x-forwarded-proto': v } : {});
    expect(isHttps({ url: 'https://shop.example/jobs', headers: h() })).toBe(true);
    expect(isHttps({ url: 'http://10.0.0.2:3000/jobs', headers: h('https') })).toBe(true);
    expect(isHttps({ url: 'http://10.0.0.2:3000/jobs', headers: h('http') })).toBe(false);
  });
});
