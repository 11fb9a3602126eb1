import { z } from 'zod';
import { text } from './text';

/**
 * The customer's answer on their quote page: accept with their full name typed and the shop's terms agreed to, or
 * decline, with a reason if they care to give one.
 */
export const quoteAnswerSchema = z.discriminatedUnion(
  'answer',
  [
    z.object({
      answer: z.literal('accept'),
      fullName: text({ min: 2, minMessage: 'Type your full name to accept.', max: 120, maxMessage: 'Keep your name under 120 characters.' }),
      agree: z.literal(true, { error: 'Tick the box to agree to the terms.' }),
    }),
    z.object({
      answer: z.literal('decline'),
      reason: text({ multiline: true, max: 1000, maxMessage: 'Keep the reason under 1,000 characters.' }).default(''),
    }),
  ],
  { error: 'Accept or decline the quote.' },
);

export type QuoteAnswer = z.output<typeof quoteAnswerSchema>;
export type QuoteAnswerInput = z.input<typeof quoteAnswerSchema>;
