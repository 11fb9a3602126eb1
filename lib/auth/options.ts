import 'server-only';
import bcrypt from 'bcryptjs';
import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { z } from 'zod';
import { getDb } from '@/db/client';
import { hasPassword } from '@/db/queries/user-links';
import { findActiveUserByEmail } from '@/db/queries/users';
import { serverEnv } from '@/lib/env';

const credentialsSchema = z.object({
  email: z.string().trim().min(3).max(320),
  password: z.string().min(1).max(200),
});

// Compared against when the e-mail is unknown, so a wrong address costs as long as a wrong password.
const DUMMY_HASH = '$2b$10$CwTycUXWue0Thq9StjUM0uJ8.vY9t7zAUMiAOFY9zCMY4Ko8J7sBu';

export function authOptions(): NextAuthOptions {
  return {
    secret: serverEnv().NEXTAUTH_SECRET,
    session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
    pages: { signIn: '/sign-in', error: '/sign-in' },
    providers: [
      CredentialsProvider({
        name: 'Kerfwise',
        credentials: { email: { label: 'E-mail', type: 'email' }, password: { label: 'Password', type: 'password' } },
        async authorize(raw) {
          const parsed = credentialsSchema.safeParse(raw);
          if (!parsed.success) return null;
          const user = await findActiveUserByEmail(await getDb(), parsed.data.email);
          // Someone invited who has not chosen a password yet has none to match.
          const usable = user && hasPassword(user.passwordHash) ? user.passwordHash : null;
          const ok = await bcrypt.compare(parsed.data.password, usable ?? DUMMY_HASH);
          if (!user || !usable || !ok) return null;
          return { id: user.id, name: user.name, email: user.email, shopId: user.shopId, role: user.role, tokenVersion: user.tokenVersion };
        },
      }),
    ],
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
        // The page side re-checks these claims against the database on every render (lib/auth/session.ts).
        return {
          ...session,
          user: { ...session.user, userId: token.userId, shopId: token.shopId, role: token.role, tokenVersion: token.tokenVersion },
        };
      },
    },
  };
}
