import { z } from 'zod';

const WEAK_SECRETS = new Set(['secret', 'changeme', 'password', 'development', 'nextauth', 'kerfwise']);

export const secretSchema = z
  .string({ error: 'NEXTAUTH_SECRET is not set. Generate one with: openssl rand -base64 32' })
  .min(32, 'NEXTAUTH_SECRET must be at least 32 characters. Generate one with: openssl rand -base64 32')
  .refine((s) => new Set(s).size >= 12 && !WEAK_SECRETS.has(s.toLowerCase()), {
    message: 'NEXTAUTH_SECRET is too predictable. Generate one with: openssl rand -base64 32',
  });

const serverEnvSchema = z.object({
  NEXTAUTH_SECRET: secretSchema,
  DATABASE_URL: z
    .string()
    .regex(/^postgres(ql)?:\/\//, 'DATABASE_URL must start with postgres:// (leave it unset for the embedded database)')
    .optional(),
  KERFWISE_DATA_DIR: z.string().min(1).default('./data'),
});

export type ServerEnv = z.infer<typeof serverEnvSchema>;

let cached: ServerEnv | undefined;

/** The server's environment, checked once; throws one readable message per problem. */
export function serverEnv(): ServerEnv {
  if (cached) return cached;
  const parsed = serverEnvSchema.safeParse({
    NEXTAUTH_SECRET: process.env.NEXTAUTH_SECRET,
    DATABASE_URL: process.env.DATABASE_URL || undefined,
    KERFWISE_DATA_DIR: process.env.KERFWISE_DATA_DIR || undefined,
  });
  if (!parsed.success) {
    throw new Error('Kerfwise cannot start:\n' + parsed.error.issues.map((i) => `- ${i.message}`).join('\n'));
  }
  cached = parsed.data;
  return cached;
}
