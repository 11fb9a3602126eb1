import { describe, expect, test } from 'vitest';
import { appBaseUrl, mailConfig } from './config';

describe('where mail goes (lib/mail/config)', () => {
  test('a real SMTP_URL: real delivery, and no demo catcher (the Sent mail page is refused)', () => {
    const c = mailConfig({ SMTP_URL: 'smtp://user:pw@mail.example.com:587', MAIL_FROM: 'Larkspur <office@larkspur.example>' });
    expect(c).toEqual({
      mode: 'smtp',
      url: 'smtp://user:pw@mail.example.com:587',
      from: 'Larkspur <office@larkspur.example>',
      domain: 'larkspur.example',
    });
  });

  test('no SMTP_URL: the local catcher, storing into the data directory’s mail folder', () => {
    const c = mailConfig({ KERFWISE_DATA_DIR: '/tmp/kw-data', KERFWISE_MAIL_CATCHER_URL: 'smtp://127.0.0.1:2525' });
    expect(c).toMatchObject({ mode: 'catcher', url: 'smtp://127.0.0.1:2525', dir: '/tmp/kw-data/mail', domain: 'kerfwise.localhost' });
    expect(mailConfig({ KERFWISE_DATA_DIR: '/tmp/kw-data' })).toMatchObject({ mode: 'catcher', url: null });
  });

  test('a malformed SMTP_URL stops the server with a clear message', () => {
    expect(() => mailConfig({ SMTP_URL: 'mail.example.com' })).toThrow(/SMTP_URL must look like smtp:\/\//);
  });

  test('links start with NEXTAUTH_URL, without a trailing slash', () => {
    expect(appBaseUrl({ NEXTAUTH_URL: 'https://kerfwise.larkspur.example/' })).toBe('https://kerfwise.larkspur.example');
  });
});
