import type { ReactNode } from 'react';
import { Logo } from '@/components/shell/logo';

export default function AuthLayout({ children }: { children: ReactNode }) {
  return (
    <div className="flex min-h-screen items-center justify-center bg-paper-deep px-4">
      <div className="w-full max-w-sm">
        <div className="mb-6 flex items-center justify-center gap-2">
          <Logo className="h-9 w-9" />
          <span className="text-2xl font-semibold tracking-tight">Kerfwise</span>
        </div>
        {children}
      </div>
    </div>
  );
}
