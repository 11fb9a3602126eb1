/** Which saw-order step a tick is about: the stock piece (0-based, as in the plan document) and the step's number. */
import { z } from 'zod';

export const stepRefSchema = z.object({
  piece: z.coerce
    .number({ error: 'Say which stock piece.' })
    .int('The stock piece is a whole number.')
    .min(0, 'The stock piece is 0 or more.')
    .max(10_000),
  step: z.coerce.number({ error: 'Say which step.' }).int('The step is a whole number.').min(1, 'Steps are numbered from 1.').max(100_000),
});
export type StepRefInput = z.infer<typeof stepRefSchema>;
