import type { ReactNode } from 'react';
import { currentShopSettings, requirePageUser } from '@/server/auth/session';
import { ROLE_LABELS } from '@/lib/auth/permissions';
import { navFor } from '@/lib/nav';
import { Logo } from '@/components/shell/logo';
import { NavLinks } from '@/components/shell/nav-links';
import { ShellFrame } from '@/components/shell/shell-frame';
import { SignOutButton } from '@/components/shell/sign-out-button';

export const dynamic = 'force-dynamic';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const user = await requirePageUser();
  const shop = await currentShopSettings(user.shopId);
  const brand = (
    <div className="flex min-w-0 items-center gap-2">
      <Logo />
      <div className="min-w-0">
        <div className="text-base font-semibold leading-tight">Kerfwise</div>
        <div className="text-xs text-graphite-mute">{shop?.name}</div>
      </div>
    </div>
  );
  return (
    <ShellFrame
      brand={brand}
      sidebar={
        <>
          <NavLinks items={navFor(user.role)} />
          <div className="mt-auto border-t border-paper-edge px-2 pt-3">
            <div className="text-sm font-medium" data-testid="signed-in-as">
              {user.name}
            </div>
            <div className="mb-2 text-xs text-graphite-mute" data-testid="signed-in-role">
              {ROLE_LABELS[user.role]}
            </div>
            <SignOutButton />
          </div>
        </>
      }
    >
      {children}
    </ShellFrame>
  );
}
