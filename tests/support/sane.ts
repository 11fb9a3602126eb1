import { expect } from 'vitest';

/** What calling `f` came to: its value, or the error it threw. */
export function outcome<T>(f: () => T): { ok: true; value: T } | { ok: false; error: unknown } {
  try {
    return { ok: true, value: f() };
  } catch (error) {
    return { ok: false, error };
  }
}

/** Every number inside `value` is finite and no text in it shows NaN, Infinity or undefined. */
export function expectSane(value: unknown, path = 'result'): void {
  if (typeof value === 'number') expect(Number.isFinite(value), `${path} = ${value}`).toBe(true);
  else if (typeof value === 'string') expect(value, path).not.toMatch(/NaN|Infinity|undefined/);
  else if (Array.isArray(value)) value.forEach((v, i) => expectSane(v, `${path}[${i}]`));
  else if (value && typeof value === 'object') for (const [k, v] of Object.entries(value)) expectSane(v, `${path}.${k}`);
}

/**
 * The contract of every public function of lib/units, lib/lumber and lib/joinery: a finite, sensible value (checked by
 * `sensible`), or a RangeError with a message — never NaN, Infinity or a number that means nothing.
 */
export function expectSaneOrRefused<T>(f: () => T, sensible: (value: T) => void = () => {}): void {
  const result = outcome(f);
  if (!result.ok) {
    expect(result.error).toBeInstanceOf(RangeError);
    expect((result.error as Error).message.length).toBeGreaterThan(10);
    return;
  }
  expectSane(result.value);
  sensible(result.value);
}
