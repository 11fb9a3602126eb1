'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { api } from '@/lib/client/api';

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
            await api(`/api/outbox/${id}/retry`, { method: 'POST' });
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
