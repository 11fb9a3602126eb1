import { z } from 'zod';

/**
 * Control characters no free text needs: C0 (NUL through US), DEL and C1. Tab, line feed and carriage return are
 * allowed where the text may run over several lines (notes). PostgreSQL refuses NUL in text outright (a 500 before
 * this); the others are invisible, break CSV and PDF output, and are refused too.
 */
const CONTROL_SINGLE_LINE = /[\u0000-\u001F\u007F-\u009F]/;
const CONTROL_MULTI_LINE = /[\u0000-\u0008\u000B\u000C\u000E-\u001F\u007F-\u009F]/;
/** A UTF-16 half with no other half: not a character, and not valid UTF-8 when stored. */
const LONE_SURROGATE = /[\uD800-\uDBFF](?![\uDC00-\uDFFF])|(?<![\uD800-\uDBFF])[\uDC00-\uDFFF]/;

export const CONTROL_CHARACTER_MESSAGE = 'Remove the control character (an invisible character such as NUL) from this text.';

export interface TextOptions {
  /** At most this many characters (after trimming); fields chain their own `.max(n, message)` too. */
  max?: number;
  maxMessage?: string;
  /** At least this many characters (after trimming); 0 allows empty text. */
  min?: number;
  minMessage?: string;
  /** Allows tab and line breaks (notes, reasons). */
  multiline?: boolean;
}

/**
 * The one schema for free text typed by people (names, materials, notes, labels, reasons): trimmed, within its
 * length, and free of control characters, each with a message for the field (422 at the API).
 */
export function text({ max = 100_000, maxMessage, min = 0, minMessage, multiline = false }: TextOptions = {}) {
  const control = multiline ? CONTROL_MULTI_LINE : CONTROL_SINGLE_LINE;
  let schema = z
    .string({ error: 'Enter text here.' })
    .trim()
    .refine((s) => !control.test(s), CONTROL_CHARACTER_MESSAGE)
    .refine((s) => !LONE_SURROGATE.test(s), 'This text holds a broken character; type it again.')
    .max(max, maxMessage ?? `At most ${max.toLocaleString('en-US')} characters.`);
  if (min > 0) schema = schema.min(min, minMessage ?? (min === 1 ? 'This cannot be empty.' : `At least ${min} characters.`));
  return schema;
}

/** True when the text holds a character `text()` refuses (for checks outside a schema). */
export function hasControlCharacter(value: string, multiline = false): boolean {
  return (multiline ? CONTROL_MULTI_LINE : CONTROL_SINGLE_LINE).test(value) || LONE_SURROGATE.test(value);
}
