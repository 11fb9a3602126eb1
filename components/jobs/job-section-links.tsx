'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';

const SECTIONS = [
  { href: '', label: 'Cut list' },
  { href: '/drawers', label: 'Drawer schedules' },
  { href: '/plan', label: 'Plan' },
  { href: '/takeoff', label: 'Takeoff' },
] as const;

export function JobSectionLinks({ jobId }: { jobId: string }) {
  const pathname = usePathname();
  const base = `/jobs/${jobId}`;
  return (
    <nav aria-label="Job sections" className="mb-6 flex gap-1 border-b border-paper-edge print:hidden">
      {SECTIONS.map((s) => {
        const href = base + s.href;
        const active = s.href === '' ? pathname === base : pathname.startsWith(href);
        return (
          <Link
            key={s.label}
            href={href}
            aria-current={active ? 'page' : undefined}
            className={`-mb-px border-b-2 px-4 py-2 text-sm font-medium no-underline ${
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
