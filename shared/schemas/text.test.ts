import { describe, expect, test } from 'vitest';
import fc from 'fast-check';
import { CONTROL_CHARACTER_MESSAGE, text } from './text';
import { teamMemberInputSchema } from './user';
import { partInputSchema } from './part';

// The control characters are Unicode's Cc category (C0 U+0000–U+001F, DEL U+007F, C1 U+0080–U+009F): the Unicode
// Standard, chapter 23.1; \p{Cc} below is the JavaScript engine's own table of it, a reference outside this code.
const isControl = (ch: string) => /\p{Cc}/u.test(ch);

describe('text()', () => {
  test('refuses NUL and other control characters with one field message', () => {
    for (const bad of ['a\u0000b', '\u0007bell', 'esc\u001b[31m', 'del\u007f', 'c1\u0085']) {
      const r = text({ max: 50 }).safeParse(bad);
      expect(r.success, JSON.stringify(bad)).toBe(false);
      expect(r.error?.issues.map((i) => i.message)).toEqual([CONTROL_CHARACTER_MESSAGE]);
    }
  });

  test('single-line text refuses line breaks and tabs inside; multi-line text keeps them', () => {
    expect(text().safeParse('two\nlines').success).toBe(false);
    expect(text({ multiline: true }).parse('two\nlines\tand a tab\r\n')).toBe('two\nlines\tand a tab');
    expect(text({ multiline: true }).safeParse('still no \u0000').success).toBe(false);
  });

  test('trims, then checks length; a lone surrogate is refused', () => {
    expect(text({ min: 1, max: 3 }).parse('  abc  ')).toBe('abc');
    expect(text({ min: 1, max: 3, minMessage: 'Name it.' }).safeParse('   ').error?.issues[0].message).toBe('Name it.');
    expect(text().safeParse('half \ud800 of a pair').success).toBe(false);
    expect(text().parse('a real pair 🪚')).toBe('a real pair 🪚');
  });

  test('property: a string is accepted (single line) exactly when it holds no Cc character (seeded)', () => {
    const seed = 20261203;
    console.log(`fast-check seed ${seed}`);
    fc.assert(
      fc.property(fc.string({ unit: 'grapheme', maxLength: 40 }), (s) => {
        const ok = text().safeParse(s).success;
        expect(ok).toBe(![...s.trim()].some(isControl));
      }),
      { seed, numRuns: 500 },
    );
  });
});

describe('fields that use it', () => {
  test('an e-mail with spaces around it is trimmed before it is checked', () => {
    const parsed = teamMemberInputSchema.parse({
      name: 'Tomas Reyes',
      email: '  Tomas@Larkspur.example ',
      role: 'cutter',
      password: 'a-long-enough-password',
    });
    expect(parsed.email).toBe('tomas@larkspur.example');
    expect(
      teamMemberInputSchema.safeParse({ name: 'T', email: 'not an address', role: 'cutter', password: 'a-long-enough-password' }).error?.issues[0]
        .message,
    ).toBe('Enter a valid e-mail address.');
  });

  test('a part length of 5e-324 mm (or anything under half a millimetre) is refused; 0.5 mm is taken', () => {
    const part = { label: 'Shim', quantity: 1, length: 5e-324, width: 20, thickness: 3, material: 'Maple' };
    expect(partInputSchema.safeParse(part).error?.issues.map((i) => i.message)).toEqual(['Length must be at least 0.5 mm.']);
    expect(partInputSchema.safeParse({ ...part, length: 0.49 }).success).toBe(false);
    expect(partInputSchema.parse({ ...part, length: 0.5 }).length).toBe(0.5);
  });
});
