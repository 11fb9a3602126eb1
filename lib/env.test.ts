import { describe, expect, test } from 'vitest';
import { secretSchema } from './env';

describe('NEXTAUTH_SECRET', () => {
  test.each([
    [undefined, /is not set/],
    ['short-secret', /at least 32 characters/],
    ['a'.repeat(40), /too predictable/],
    ['abababababababababababababababababab', /too predictable/],
  ])('%j is refused with a message saying why', (value, message) => {
    const result = secretSchema.safeParse(value);
    expect(result.success).toBe(false);
    expect(result.error!.issues[0].message).toMatch(message);
  });

  test('a random 32-byte value (openssl rand -base64 32) is accepted', () => {
    expect(secretSchema.safeParse('q3V9m1Xo7cRk2LwZ8pTn4sBf6yHd0aJe5uGi1KxOv2E=').success).toBe(true);
  });
});
