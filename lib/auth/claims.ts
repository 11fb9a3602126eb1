import { z } from 'zod';

/** What a session token must carry; anything else is treated as signed out. */
export const sessionClaimsSchema = z.object({
  userId: z.uuid(),
  shopId: z.uuid(),
  tokenVersion: z.number().int(),
});

export type SessionClaims = z.infer<typeof sessionClaimsSchema>;

export function claimsFromToken(token: unknown): SessionClaims | null {
  const parsed = sessionClaimsSchema.safeParse(token);
  return parsed.success ? parsed.data : null;
}
