'use client';

import { useState, type FormEvent } from 'react';

export function ForgotPasswordForm() {
  const [done, setDone] = useState<string | null>(null);
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const email = String(new FormData(event.currentTarget).get('email') ?? '');
    setPending(true);
    setError(null);
    const res = await fetch('/api/password-resets', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email }),
    });
    const data = await res.json().catch(() => ({}));
    setPending(false);
    if (!res.ok) setError(data.fields?.email?.[0] ?? data.error ?? `That did not work (${res.status}).`);
    else setDone(data.message);
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
