import type { ReactNode } from 'react';

/** Pages for a shop's customers (no sign-in): the shop's own look, plain and printable. */
export default function CustomerLayout({ children }: { children: ReactNode }) {
  return (
    <div className="min-h-screen bg-paper-deep px-3 py-6 sm:px-6 sm:py-10">
      <main className="mx-auto w-full max-w-3xl">{children}</main>
    </div>
  );
}
