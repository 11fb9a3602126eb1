'use client';

import Link from 'next/link';
import { usePathname } from 'next/navigation';
import type { NavItem } from '@/lib/nav';

export function NavLinks({ items }: { items: NavItem[] }) {
  const pathname = usePathname();
  return (
    <nav aria-label="Main" className="flex flex-col gap-0.5">
      {items.map((item) => {
        const active = pathname === item.href || pathname.startsWith(item.href + '/');
        return (
          <Link
            key={item.href}
            href={item.href}
            aria-current={active ? 'page' : undefined}
            className={`rounded-md px-3 py-2 no-underline transition ${
              active ? 'bg-graphite text-paper' : 'text-graphite-soft hover:bg-paper-deep hover:text-graphite'
            }`}
          >
            <span className="block text-sm font-medium">{item.label}</span>
            <span className={`block text-xs ${active ? 'text-paper/70' : 'text-graphite-mute'}`}>{item.hint}</span>
          </Link>
        );
      })}
    </nav>
  );
}
