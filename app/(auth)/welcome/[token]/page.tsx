import type { Metadata } from 'next';
import { LinkPage } from '../../link-page';

export const metadata: Metadata = { title: 'Accept your invite', referrer: 'no-referrer' };

export default async function WelcomePage({ params }: { params: Promise<{ token: string }> }) {
  return <LinkPage purpose="invite" token={(await params).token} />;
}
