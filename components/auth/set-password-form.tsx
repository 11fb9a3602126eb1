'use client';

import { signIn } from 'next-auth/react';
import { useState, type FormEvent } from 'react';
import { ApiError, call } from '@/client/api';

/** Which single-use link the page opened: an invite, or a reset of a forgotten password. */
export interface PasswordLink {
  purpose: 'invite' | 'password-reset';
  token: string;
}

/** Chooses a password through a single-use link, then signs in with it. */
export function SetPasswordForm({ link, email, submitLabel }: { link: PasswordLink; email: string; submitLabel: string }) {
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const password = String(form.get('password') ?? '');
    if (password !== String(form.get('confirm') ?? '')) {
      setError('The two passwords are not the same.');
      return;
    }
    setPending(true);
    setError(null);
    try {
      const init = { params: { token: link.token }, body: { password } };
      await (link.purpose === 'invite' ? call('POST /api/invites/:token', init) : call('POST /api/password-resets/:token', init));
    } catch (e) {
      setError(e instanceof ApiError ? (e.fields.password?.[0] ?? e.message) : 'That did not work. Check the connection and try again.');
      setPending(false);
      return;
    }
    const signedIn = await signIn('credentials', { email, password, redirect: false });
    window.location.assign(signedIn && !signedIn.error ? '/' : '/sign-in');
  }

  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      <input type="email" name="username" autoComplete="username" value={email} readOnly hidden />
      <div>
        <label htmlFor="password" className="field-label">
          New password
        </label>
        <input
          id="password"
          name="password"
          type="password"
          autoComplete="new-password"
          required
          minLength={10}
          className="field-input"
          aria-describedby="password-hint"
        />
        <p id="password-hint" className="mt-1 text-xs text-graphite-mute">
          At least 10 characters. A few unrelated words are easy to remember and hard to guess.
        </p>
      </div>
      <div>
        <label htmlFor="confirm" className="field-label">
          The same again
        </label>
        <input id="confirm" name="confirm" type="password" autoComplete="new-password" required className="field-input" />
      </div>
      {error && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          {error}
        </p>
      )}
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? 'Saving…' : submitLabel}
      </button>
    </form>
  );
}
