'use client';

import { signIn } from 'next-auth/react';
import { useState, type FormEvent } from 'react';

export function SignInForm() {
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setPending(true);
    setError(null);
    const result = await signIn('credentials', {
      email: String(form.get('email') ?? ''),
      password: String(form.get('password') ?? ''),
      redirect: false,
    });
    if (result?.status === 429) {
      // Throttled: too many wrong attempts for this e-mail or from this address (known account or not).
      const seconds = Number(/^TooManyAttempts:(\d+)$/.exec(result.error ?? '')?.[1]) || 60;
      const minutes = Math.max(1, Math.ceil(seconds / 60));
      setError(`Too many sign-in attempts. Try again in ${minutes} minute${minutes === 1 ? '' : 's'}.`);
      setPending(false);
      return;
    }
    if (!result || result.error) {
      // One message for every failure: it must not tell which of the two was wrong.
      setError('That e-mail and password do not match an active account.');
      setPending(false);
      return;
    }
    window.location.assign('/');
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      <div>
        <label htmlFor="email" className="field-label">
          E-mail
        </label>
        <input id="email" name="email" type="email" autoComplete="username" required className="field-input" />
      </div>
      <div>
        <label htmlFor="password" className="field-label">
          Password
        </label>
        <input id="password" name="password" type="password" autoComplete="current-password" required className="field-input" />
      </div>
      {error && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          {error}
        </p>
      )}
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
