import { z } from 'zod';
import { text } from './text';
import { jointMethodSchema } from '@/shared/schemas/drawer-schedule';

/** One saved machine setting on a setup card (bit height, fence setback, …). */
export const setupCardFieldSchema = z.object({
  key: z.string().regex(/^[a-z][a-z0-9-]*$/, { error: 'Field key must be kebab-case' }),
  label: text().min(1).max(80),
  value: z.number().finite(),
  unit: z.enum(['mm', 'rpm', 'deg']),
});

/** A shop's saved machine setup for one joint in one stock thickness. */
export const setupCardSchema = z.object({
  joint: jointMethodSchema,
  stockThickness: z.number().finite().positive({ error: 'Stock thickness must be more than 0 mm' }),
  fields: z.array(setupCardFieldSchema).max(20),
  note: text({ multiline: true }).max(2000).default(''),
});

export type SetupCardField = z.infer<typeof setupCardFieldSchema>;
export type SetupCard = z.output<typeof setupCardSchema>;
export type SetupCardInput = z.input<typeof setupCardSchema>;
