import { z } from 'zod';
import { LINK_TOKEN, useLink } from '@/db/queries/user-links';
import { ANYONE, route } from '@/server/api/route';
import { countingFailedLinks, throttlePublicRequest } from '@/server/api/throttle';
import { newPasswordSchema } from '@/shared/schemas/user';

// POST /api/password-resets/:token – public: choose a new password with a reset link (the link works once)
export const POST = route(
  { permission: ANYONE, params: z.object({ token: z.string().regex(LINK_TOKEN) }), body: newPasswordSchema },
  async ({ req, db, params, body }) => {
    await throttlePublicRequest(req, 'link-use');
    return countingFailedLinks(req, () => useLink(db, 'password-reset', params.token, body.password));
  },
);
