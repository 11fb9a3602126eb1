import { z } from 'zod';
import { text } from './text';
import { ROLES } from '@/lib/auth/permissions';

const password = z
  .string()
  .min(10, 'Use at least 10 characters for the password.')
  .max(200, 'Keep the password under 200 characters.')
  // Spaces and any printable character are welcome; invisible control characters (NUL…) are a slip, never typed.
  .refine((s) => !/[\u0000-\u001F\u007F-\u009F]/.test(s), 'A password cannot hold control characters (such as NUL).');

/** A new person: with a first password the owner hands over, or (no password) an invite by mail to choose one. */
export const teamMemberInputSchema = z.object({
  name: text().min(1, 'Enter the person’s name.').max(120),
  // Trimmed and lower-cased before it is checked: a pasted address with spaces around it is fine.
  email: z
    .string({ error: 'Enter a valid e-mail address.' })
    .trim()
    .toLowerCase()
    .max(320, 'Keep the e-mail under 320 characters.')
    .pipe(z.email('Enter a valid e-mail address.')),
  role: z.enum(ROLES, { error: 'Pick owner, estimator or cutter.' }),
  password: password.optional(),
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
  /** Invited and has not chosen a password yet. */
  invited: boolean;
  createdAt: string;
}

export const newPasswordSchema = z.object({ password });
export const passwordResetRequestSchema = z.object({ email: z.email('Enter a valid e-mail address.').trim().toLowerCase().max(320) });
