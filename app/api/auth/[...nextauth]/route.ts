// GET|POST /api/auth/* – next-auth's own sign-in, sign-out, session and CSRF endpoints (public by nature);
// the credentials sign-in is throttled by account and by address (server/auth/sign-in-throttle.ts)
import NextAuth from 'next-auth';
import { authOptions } from '@/server/auth/options';
import { throttledSignIn } from '@/server/auth/sign-in-throttle';

type Handler = (req: Request, ctx: { params: Promise<{ nextauth: string[] }> }) => Promise<Response>;

const nextAuth: Handler = (req, ctx) => (NextAuth(authOptions()) as unknown as Handler)(req, ctx);

const handler: Handler = async (req, ctx) => {
  const { nextauth } = await ctx.params;
  if (req.method === 'POST' && nextauth.join('/') === 'callback/credentials') return throttledSignIn(req, (r) => nextAuth(r, ctx));
  return nextAuth(req, ctx);
};

export { handler as GET, handler as POST };
