import 'server-only';
import bcrypt from 'bcryptjs';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { hasPassword } from '@/db/queries/user-links';
import { findActiveUserByEmail, revokeSessions } from '@/db/queries/users';
import { claimsFromToken } from '@/lib/auth/claims';
import { serverEnv } from '@/lib/env';

const credentialsSchema = z.object({
  email: z.string().trim().min(3).max(320),
  password: z.string().min(1).max(200),
});

// Compared against when the e-mail is unknown, so a wrong address costs as long as a wrong password.
export const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.vY9t7zAUMiAOFY9zCMY4Ko8J7sBu';

/** True when the app's public address (NEXTAUTH_URL) is https. */
export function secureCookies(url = process.env.NEXTAUTH_URL): boolean {
  return (url ?? '').trim().toLowerCase().startsWith('https://');
}

export function authOptions(): NextAuthOptions {
  return {
    secret: serverEnv().NEXTAUTH_SECRET,
    session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
    // Secure (and __Secure-/__Host- prefixed) cookies whenever people reach the app over https.
    useSecureCookies: secureCookies(),
    pages: { signIn: '/sign-in', error: '/sign-in' },
    providers: [
      CredentialsProvider({
        name: 'Kerfwise',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(raw) {
          // The same work whatever was sent: one lookup (when the e-mail could be one) and one hash compare, so the
          // time taken does not tell a known address from an unknown one.
          const parsed = credentialsSchema.safeParse(raw);
          const user = parsed.success ? await findActiveUserByEmail(await getDb(), parsed.data.email) : null;
          // Someone invited who has not chosen a password yet has none to match.
          const usable = user && hasPassword(user.passwordHash) ? user.passwordHash : null;
          const ok = await bcrypt.compare(parsed.success ? parsed.data.password : '', usable ?? DUMMY_HASH);
          if (!parsed.success || !user || !usable || !ok) return null;
          return { id: user.id, name: user.name, email: user.email, shopId: user.shopId, role: user.role, tokenVersion: user.tokenVersion };
        },
      }),
    ],
    events: {
      // Sign-out revokes: the cookie it clears would otherwise keep working until it expires if someone kept a copy.
      async signOut({ token }) {
        const claims = claimsFromToken(token);
        if (claims) await revokeSessions(await getDb(), claims);
      },
    },
    callbacks: {
      async jwt({ token, user }) {
        if (user) {
          const u = user as unknown as { id: string; shopId: string; role: string; tokenVersion: number };
          token.userId = u.id;
          token.shopId = u.shopId;
          token.role = u.role;
          token.tokenVersion = u.tokenVersion;
        }
        return token;
      },
      async session({ session, token }) {
        // The page side re-checks these claims against the database on every render (server/auth/session.ts).
        return {
          ...session,
          user: { ...session.user, userId: token.userId, shopId: token.shopId, role: token.role, tokenVersion: token.tokenVersion },
        };
      },
    },
  };
}
