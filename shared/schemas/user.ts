import { z } from 'zod';
import { text } from './text';
import { ROLES } from '@/lib/auth/permissions';

const password = z
  .string()
  .min(10, 'Use at least 10 characters for the password.')
  .max(200, 'Keep the password under 200 characters.');

export const teamMemberInputSchema = z.object({
  name: text().min(1, 'Enter the person’s name.').max(120),
  // Trimmed and lower-cased before it is checked: a pasted address with spaces around it is fine.
  email: z.string({ error: 'Enter a valid e-mail address.' }).trim().toLowerCase().max(320, 'Keep the e-mail under 320 characters.').pipe(z.email('Enter a valid e-mail address.')),
  role: z.enum(ROLES, { error: 'Pick owner, estimator or cutter.' }),
  password,
});
export type TeamMemberInput = z.infer<typeof teamMemberInputSchema>;

export const teamMemberPatchSchema = z
  .object({
    name: text().min(1).max(120),
    role: z.enum(ROLES, { error: 'Pick owner, estimator or cutter.' }),
    active: z.boolean(),
    password,
  })
  .partial()
  .refine((v) => Object.keys(v).length > 0, 'Nothing to change.');
export type TeamMemberPatch = z.infer<typeof teamMemberPatchSchema>;

export interface TeamMember {
  id: string;
  name: string;
  email: string;
  role: (typeof ROLES)[number];
  active: boolean;
  createdAt: string;
}
