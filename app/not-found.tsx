import type { Metadata } from 'next';
import { NotFoundMessage } from '@/components/ui/not-found-message';

export const metadata: Metadata = { title: 'Not found' };

/** Any address nothing answers, signed in or not. */
export default function NotFound() {
  return (
    <main className="min-h-screen px-4 py-10">
      <NotFoundMessage home="/" />
    </main>
  );
}
