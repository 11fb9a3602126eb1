'use client';

import { useState, type FormEvent } from 'react';
import { ApiError, call } from '@/client/api';

export function ForgotPasswordForm() {
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = String(new FormData(event.currentTarget).get('email') ?? '');
    setPending(true);
    setError(null);
    try {
      setDone((await call('POST /api/password-resets', { body: { email } })).message);
    } catch (e) {
      setError(e instanceof ApiError ? (e.fields.email?.[0] ?? e.message) : 'That did not work. Check the connection and try again.');
    }
    setPending(false);
  }

  if (done)
    return (
      <p role="status" className="rounded-md bg-sage-wash px-3 py-2 text-sm text-sage">
        {done}
      </p>
    );
  return (
    <form onSubmit={onSubmit} className="flex flex-col gap-4" noValidate>
      <div>
        <label htmlFor="email" className="field-label">
          E-mail
        </label>
        <input id="email" name="email" type="email" autoComplete="username" required className="field-input" />
      </div>
      {error && (
        <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
          {error}
        </p>
      )}
      <button type="submit" className="btn-primary" disabled={pending}>
        {pending ? 'Sending…' : 'Mail me a link'}
      </button>
    </form>
  );
}
