import 'server-only';
import type { NextRequest } from 'next/server';

/** The public routes that may be hammered from outside: asking for a reset link, and using a link's token. */
export type ThrottledAction = 'password-reset-request' | 'link-use';

/**
 * THE place where throttling of the public (signed-out) routes plugs in: every such route calls this first, with
 * the request and what it is about to do. It lets everything through for now; the shop's rate limiter (from the
 * web-edge work) goes here, throwing `new HttpError(429, …)` when a caller has asked too often.
 */
export async function throttlePublicRequest(_req: NextRequest, _action: ThrottledAction, _key?: string): Promise<void> {
  // No limiter yet: see above.
}
