import { describe, expect, test } from 'vitest';
import { siteOrigin } from './site-origin';

describe('the origin QR codes point at', () => {
  test.each([
    ['the configured public URL wins', { host: 'internal:3000' }, 'https://shop.example/app', 'https://shop.example'],
    [
      'else the forwarded host and scheme (first of a list)',
      { host: 'internal:3000', 'x-forwarded-host': 'kerf.example, proxy', 'x-forwarded-proto': 'https,http' },
      undefined,
      'https://kerf.example',
    ],
    ['else the request host over http', { host: '192.168.1.20:3000' }, undefined, 'http://192.168.1.20:3000'],
  ])('%s', (_label, headers, env, origin) => expect(siteOrigin(new Headers(headers), env)).toBe(origin));
});
