import { z } from 'zod';
import { text as freeText } from './text';

const text = (what: string, max: number, multiline = false) =>
  freeText({ multiline }).max(max, `Keep ${what} under ${max.toLocaleString('en-US')} characters.`);

/** A shop's customer, checked the same on the server and in the forms. */
export const customerInputSchema = z.object({
  name: freeText().min(1, 'Give the customer a name.').max(120, 'Keep the name under 120 characters.'),
  company: text('the company', 120).default(''),
  email: z.union([z.literal(''), z.email({ error: 'That does not look like an e-mail address.' }).max(254)]).default(''),
  phone: text('the phone', 40).default(''),
  billingAddress: text('the billing address', 500, true).default(''),
  siteAddress: text('the site address', 500, true).default(''),
  notes: text('notes', 4000, true).default(''),
});
export type CustomerInput = z.infer<typeof customerInputSchema>;
export const customerPatchSchema = customerInputSchema.partial().strict();
export type CustomerPatch = z.infer<typeof customerPatchSchema>;

export interface Customer {
  id: string;
  name: string;
  company: string;
  email: string;
  phone: string;
  billingAddress: string;
  siteAddress: string;
  notes: string;
  jobCount: number;
  createdAt: string;
  updatedAt: string;
}
