import type { Metadata } from 'next';
import Link from 'next/link';
import { ForgotPasswordForm } from '@/components/auth/forgot-password-form';

export const metadata: Metadata = { title: 'Forgot your password' };

export default function ForgotPasswordPage() {
  return (
    <div className="card p-6 shadow-sm">
      <h1 className="mb-1 text-xl">Forgot your password?</h1>
      <p className="mb-5 text-sm text-graphite-mute">Enter the address you sign in with. We mail you a link to choose a new password.</p>
      <ForgotPasswordForm />
      <p className="mt-5 text-sm">
        <Link href="/sign-in" className="underline">
          Back to sign in
        </Link>
      </p>
    </div>
  );
}
