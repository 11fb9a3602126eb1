// GET|POST /api/auth/* – next-auth's own sign-in, sign-out, session and CSRF endpoints (public by nature)
import NextAuth from 'next-auth';
import { authOptions } from '@/lib/auth/options';

type Handler = (req: Request, ctx: { params: Promise<{ nextauth: string[] }> }) => Promise<Response>;

const handler: Handler = (req, ctx) => (NextAuth(authOptions()) as unknown as Handler)(req, ctx);

export { handler as GET, handler as POST };
