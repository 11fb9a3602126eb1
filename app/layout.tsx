import type { Metadata } from 'next';
import type { ReactNode } from 'react';
import { connection } from 'next/server';
import { Providers } from '@/components/providers';
import { plexMono, plexMonoSymbols, plexSans, plexSansSymbols } from './fonts';
import './globals.css';

export const metadata: Metadata = {
  title: { default: 'Kerfwise', template: '%s · Kerfwise' },
  description: 'Cut lists, nesting, saw orders and stock for small cabinet and furniture shops.',
};

export default async function RootLayout({ children }: { children: ReactNode }) {
  // Every page is rendered per request, so Next.js can put the request's CSP nonce (proxy.ts) on its scripts.
  await connection();
  return (
    <html lang="en" className={`${plexSans.variable} ${plexSansSymbols.variable} ${plexMono.variable} ${plexMonoSymbols.variable}`}>
      <body className="min-h-screen font-sans">
        <Providers>{children}</Providers>
      </body>
    </html>
  );
}
