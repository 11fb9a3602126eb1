'use client';

import { useRouter } from 'next/navigation';
import { useState, type FormEvent } from 'react';
import { ApiError, call } from '@/client/api';
import type { QuoteAnswerInput } from '@/shared/schemas/quote-answer';

/** The call's answer, or the first thing the server said was wrong with it. */
async function attempt<T>(request: Promise<T>): Promise<{ ok: true; data: T } | { ok: false; error: string }> {
  try {
    return { ok: true, data: await request };
  } catch (e) {
    if (!(e instanceof ApiError)) return { ok: false, error: 'That did not work. Check the connection and try again.' };
    return { ok: false, error: Object.values(e.fields)[0]?.[0] ?? e.message };
  }
}

function Alert({ error }: { error: string | null }) {
  return error ? (
    <p role="alert" className="rounded-md bg-brick-wash px-3 py-2 text-sm text-brick">
      {error}
    </p>
  ) : null;
}

/** Accept (typed full name, the terms agreed to) or decline (a reason, if they care to give one). */
export function QuoteAnswerForms({ token, shopName, deposit }: { token: string; shopName: string; deposit: string | null }) {
  const router = useRouter();
  const [error, setError] = useState<string | null>(null);
  const [declineError, setDeclineError] = useState<string | null>(null);
  const [pending, setPending] = useState<'accept' | 'decline' | null>(null);

  async function send(answer: QuoteAnswerInput, fail: (e: string) => void) {
    setPending(answer.answer);
    const result = await attempt(call('POST /api/q/:token/answer', { params: { token }, body: answer }));
    setPending(null);
    if (!result.ok) return fail(result.error);
    router.refresh();
  }

  function accept(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    setError(null);
    if (form.get('agree') !== 'on') return setError('Tick the box to agree to the terms.');
    void send({ answer: 'accept', fullName: String(form.get('fullName') ?? ''), agree: true }, setError);
  }

  function decline(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    setDeclineError(null);
    void send({ answer: 'decline', reason: String(new FormData(event.currentTarget).get('reason') ?? '') }, setDeclineError);
  }

  return (
    <section className="card flex flex-col gap-5 p-5" aria-label="Your answer">
      <form onSubmit={accept} className="flex flex-col gap-3" noValidate>
        <h2 className="text-lg">Accept the quote</h2>
        <div>
          <label htmlFor="fullName" className="field-label">
            Your full name
          </label>
          <input id="fullName" name="fullName" autoComplete="name" required minLength={2} maxLength={120} className="field-input" />
        </div>
        <label className="flex items-start gap-2 text-sm">
          <input type="checkbox" name="agree" className="mt-1" />
          <span>I accept this quote and agree to {shopName}’s terms above.</span>
        </label>
        <Alert error={error} />
        <div className="flex flex-wrap items-center gap-3">
          <button type="submit" className="btn-primary" disabled={pending !== null}>
            {pending === 'accept' ? 'Accepting…' : 'Accept the quote'}
          </button>
          {deposit && <span className="text-sm text-graphite-mute">Then pay the deposit of {deposit} online.</span>}
        </div>
      </form>
      <details className="border-t border-paper-edge pt-4">
        <summary className="cursor-pointer text-sm font-medium">Decline the quote</summary>
        <form onSubmit={decline} className="mt-3 flex flex-col gap-3" noValidate>
          <div>
            <label htmlFor="reason" className="field-label">
              Why, if you would like to say (optional)
            </label>
            <textarea id="reason" name="reason" rows={3} maxLength={1000} className="field-input" />
          </div>
          <Alert error={declineError} />
          <div>
            <button type="submit" className="btn-quiet" disabled={pending !== null}>
              {pending === 'decline' ? 'Declining…' : 'Decline the quote'}
            </button>
          </div>
        </form>
      </details>
    </section>
  );
}

/** Opens the payments service's checkout for the deposit (the amount is the server's, not this page's). */
export function PayDepositButton({ token, deposit }: { token: string; deposit: string }) {
  const [error, setError] = useState<string | null>(null);
  const [pending, setPending] = useState(false);
  async function pay() {
    setPending(true);
    setError(null);
    const result = await attempt(call('POST /api/q/:token/checkout', { params: { token } }));
    if (!result.ok) {
      setPending(false);
      return setError(result.error);
    }
    window.location.assign(result.data.url);
  }
  return (
    <div className="flex flex-col gap-2">
      <div>
        <button type="button" className="btn-accent" onClick={() => void pay()} disabled={pending}>
          {pending ? 'Opening the checkout…' : `Pay the deposit (${deposit})`}
        </button>
      </div>
      <Alert error={error} />
    </div>
  );
}
