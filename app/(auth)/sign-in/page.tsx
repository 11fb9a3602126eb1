import type { Metadata } from 'next';
import Link from 'next/link';
import { SignInForm } from '@/components/auth/sign-in-form';

export const metadata: Metadata = { title: 'Sign in' };

export default function SignInPage() {
  return (
    <div className="card p-6 shadow-sm">
      <h1 className="mb-1 text-xl">Sign in</h1>
      <p className="mb-5 text-sm text-graphite-mute">Cut lists, nesting and saw orders for your shop.</p>
      <SignInForm />
      <p className="mt-5 text-sm">
        <Link href="/forgot-password" className="underline">
          Forgot your password?
        </Link>
      </p>
    </div>
  );
}
