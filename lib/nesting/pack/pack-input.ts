import { z } from 'zod';

/**
 * The packing core's own boundary check. The plan layer validates the shop's request with the shared schemas;
 * this catches a caller that hands the core impossible numbers, with a message naming the offending entry.
 */
const length = z.number().finite().positive();

export const packItemSchema = z.object({ id: z.number().int(), w: length, h: length, canRotate: z.boolean() });

export const binTypeSchema = z.object({
  id: z.number().int(),
  w: length,
  h: length,
  count: z.number().int().min(0).nullable(),
  cost: z.number().finite().min(0),
  priority: z.number().finite(),
});

export const packOptionsSchema = z.object({
  kerf: z.number().finite().min(0),
  style: z.enum(['panel', 'strips']),
  objective: z.enum(['cost', 'pieces', 'cuts']),
  timeBudgetMs: z.number().min(0),
  seed: z.number().finite(),
});

export const packInputSchema = z
  .object({ items: z.array(packItemSchema), bins: z.array(binTypeSchema), options: packOptionsSchema })
  .superRefine((v, ctx) => {
    const seen = new Set<number>();
    v.items.forEach((it, i) => {
      if (seen.has(it.id)) ctx.addIssue({ code: 'custom', path: ['items', i, 'id'], message: `item id ${it.id} is used twice` });
      seen.add(it.id);
    });
  });

export class PackInputError extends Error {
  constructor(readonly issues: z.core.$ZodIssue[]) {
    super(`invalid packing input: ${issues.map((i) => `${i.path.join('.') || '(root)'}: ${i.message}`).join('; ')}`);
    this.name = 'PackInputError';
  }
}
