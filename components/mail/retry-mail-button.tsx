'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { call } from '@/client/api';

export function RetryMailButton({ id, subject }: { id: string; subject: string }) {
  const router = useRouter();
  const [pending, setPending] = useState(false);
  const [error, setError] = useState<string | null>(null);
  return (
    <>
      <button
        type="button"
        className="btn-quiet py-1"
        aria-label={`Try sending “${subject}” again`}
        disabled={pending}
        onClick={async () => {
          setPending(true);
          setError(null);
          try {
            await call('POST /api/outbox/:id/retry', { params: { id } });
            router.refresh();
          } catch (e) {
            setError((e as Error).message);
          } finally {
            setPending(false);
          }
        }}
      >
        {pending ? 'Queuing…' : 'Try again'}
      </button>
      {error && (
        <p role="alert" className="field-error">
          {error}
        </p>
      )}
    </>
  );
}
