import { describe, expect, test } from 'vitest';
import { secureCookies } from './options';

// The Secure attribute as RFC 6265 §4.1.2.5 defines it: sent over secure channels only.
describe('session cookies', () => {
  test('are Secure when the app URL is https', () => {
    expect(secureCookies('https://kerfwise.shop.example')).toBe(true);
    expect(secureCookies('http://127.0.0.1:3000')).toBe(false);
    expect(secureCookies(undefined)).toBe(false);
  });
});
