'use client';

import { signOut } from 'next-auth/react';

export function SignOutButton() {
  return (
    <button type="button" className="text-sm text-graphite-mute hover:text-graphite underline" onClick={() => signOut({ callbackUrl: '/sign-in' })}>
      Sign out
    </button>
  );
}
