'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { JobSection } from '@/lib/nav';

/** The job's section tabs; the layout passes only the sections the signed-in role may open. */
export function JobSectionLinks({ jobId, sections }: { jobId: string; sections: readonly JobSection[] }) {
  const pathname = usePathname();
  const base = `/jobs/${jobId}`;
  return (
    <nav aria-label="Job sections" className="-mx-4 mb-6 flex gap-1 overflow-x-auto border-b border-paper-edge px-4 sm:mx-0 sm:px-0 print:hidden">
      {sections.map((s) => {
        const href = base + s.path;
        const active = s.path === '' ? pathname === base : pathname.startsWith(href);
        return (
          <Link
            key={s.label}
            href={href}
            aria-current={active ? 'page' : undefined}
            className={`-mb-px shrink-0 whitespace-nowrap border-b-2 px-4 py-2.5 text-sm font-medium no-underline ${
              active ? 'border-oak text-graphite' : 'border-transparent text-graphite-mute hover:text-graphite'
            }`}
          >
            {s.label}
          </Link>
        );
      })}
    </nav>
  );
}
