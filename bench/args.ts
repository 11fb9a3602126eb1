/** Command-line flags of `npm run bench`, checked with zod so a typo is an error, never a silent default. */
import { z } from 'zod';

export const SECTIONS = ['standard', 'shop', 'scaling'] as const;
export const CLASS_NAMES = ['I', 'II', 'III', 'IV', 'V', 'VI', 'VII', 'VIII', 'IX', 'X'] as const;
/** The target budget per standard instance. */
export const DEFAULT_BUDGET_MS = 2000;

/** "I,III,10" or "1-4" → class numbers 1–10. */
const classList = z.string().transform((text, ctx) => {
  const out = new Set<number>();
  for (const raw of text.split(',').map((s) => s.trim().toUpperCase())) {
    const range = /^(\d+)-(\d+)$/.exec(raw);
    const one = (s: string) => {
      const n = /^\d+$/.test(s) ? Number(s) : CLASS_NAMES.indexOf(s as (typeof CLASS_NAMES)[number]) + 1;
      if (!(n >= 1 && n <= 10)) ctx.addIssue({ code: 'custom', message: `unknown class "${s}" (use I–X or 1–10)` });
      return n;
    };
    if (range) for (let n = one(range[1]); n <= one(range[2]); n++) out.add(n);
    else out.add(one(raw));
  }
  return [...out].sort((a, b) => a - b);
});

export const benchArgsSchema = z.object({
  budgetMs: z.coerce.number().int('--budget-ms must be a whole number').min(0).max(120_000).default(DEFAULT_BUDGET_MS),
  classes: classList.default([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]),
  /** First n instances of each selected class (file order: n = 20, 40, … 100, ten of each). */
  limit: z.coerce.number().int().min(1).max(50).default(50),
  modes: z.enum(['both', 'fixed', 'rotation']).default('both'),
  sections: z
    .string()
    .transform((s) => s.split(',').map((x) => x.trim()))
    .pipe(z.array(z.enum(SECTIONS)).min(1))
    .default([...SECTIONS]),
  /** Skip the maxrects-packer comparison (it adds a few seconds). */
  maxrects: z.boolean().default(true),
  /** Write the JSON results file (off for quick looks). */
  write: z.boolean().default(true),
});
export type BenchArgs = z.infer<typeof benchArgsSchema>;

export const USAGE = `npm run bench -- [--budget-ms 2000] [--classes I,III,7-10] [--limit 50] [--modes both|fixed|rotation]
                   [--sections standard,shop,scaling] [--no-maxrects] [--no-write]`;

/** `--budget-ms 200 --classes=I,II --no-maxrects` → parsed flags, or a ZodError / Error naming the bad flag. */
export function parseBenchArgs(argv: readonly string[]): BenchArgs {
  const raw: Record<string, unknown> = {};
  const camel = (flag: string) => flag.replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
  for (let i = 0; i < argv.length; i++) {
    const arg = argv[i];
    const m = /^--(no-)?([a-z-]+)(?:=(.*))?$/.exec(arg);
    if (!m) throw new Error(`unexpected argument "${arg}"\nusage: ${USAGE}`);
    const [, no, name, inline] = m;
    const key = camel(name);
    if (!(key in benchArgsSchema.shape)) throw new Error(`unknown flag --${name}\nusage: ${USAGE}`);
    if (no) raw[key] = false;
    else if (key === 'maxrects' || key === 'write') raw[key] = true;
    else if (inline !== undefined) raw[key] = inline;
    else if (i + 1 < argv.length) raw[key] = argv[++i];
    else throw new Error(`--${name} needs a value\nusage: ${USAGE}`);
  }
  return benchArgsSchema.parse(raw);
}
