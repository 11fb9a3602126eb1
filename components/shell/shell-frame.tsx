'use client';

import { usePathname } from 'next/navigation';
import { useEffect, useState, type ReactNode } from 'react';

/**
 * The signed-in frame: on a desk (1024 px and up) the sidebar stands beside the page; on a tablet or a phone a top
 * bar carries the mark and a Menu button, and the same sidebar slides in over the page. It closes on a link, on
 * Escape, and on a tap beside it.
 */
export function ShellFrame({ brand, sidebar, children }: { brand: ReactNode; sidebar: ReactNode; children: ReactNode }) {
  const [open, setOpen] = useState(false);
  const pathname = usePathname();
  useEffect(() => setOpen(false), [pathname]);
  useEffect(() => {
    if (!open) return;
    const onKey = (e: KeyboardEvent) => e.key === 'Escape' && setOpen(false);
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [open]);

  return (
    <div className="min-h-screen lg:flex">
      <header className="sticky top-0 z-30 flex items-center justify-between gap-3 border-b border-paper-edge bg-paper-deep/95 px-4 py-1.5 backdrop-blur lg:hidden print:hidden">
        {brand}
        <button type="button" className="btn-quiet min-h-11 px-4" aria-expanded={open} aria-controls="app-sidebar" onClick={() => setOpen((o) => !o)}>
          <svg viewBox="0 0 20 20" className="h-5 w-5" aria-hidden="true">
            {open ? (
              <path d="M5 5l10 10M15 5L5 15" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            ) : (
              <path d="M3 5h14M3 10h14M3 15h14" stroke="currentColor" strokeWidth="2" strokeLinecap="round" />
            )}
          </svg>
          {open ? 'Close' : 'Menu'}
        </button>
      </header>
      {open && <div className="fixed inset-0 z-30 bg-graphite/30 lg:hidden" aria-hidden="true" onClick={() => setOpen(false)} />}
      <aside
        id="app-sidebar"
        className={`fixed inset-y-0 left-0 z-40 flex w-72 max-w-[85vw] flex-col overflow-y-auto border-r border-paper-edge bg-paper-deep px-3 py-4 shadow-xl transition-transform motion-reduce:transition-none
          lg:sticky lg:top-0 lg:h-screen lg:w-60 lg:max-w-none lg:translate-x-0 lg:bg-paper-deep/60 lg:shadow-none lg:visible print:hidden
          ${open ? 'translate-x-0' : 'invisible -translate-x-full'}`}
      >
        <div className="mb-6 hidden px-2 lg:block">{brand}</div>
        {sidebar}
      </aside>
      <main className="min-w-0 flex-1 px-4 py-5 sm:px-6 lg:px-8 lg:py-6 print:p-0">{children}</main>
    </div>
  );
}
