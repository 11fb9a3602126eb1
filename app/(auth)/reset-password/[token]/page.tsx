import type { Metadata } from 'next';
import { LinkPage } from '../../link-page';

export const metadata: Metadata = { title: 'Choose a new password', referrer: 'no-referrer' };

export default async function ResetPasswordPage({ params }: { params: Promise<{ token: string }> }) {
  return <LinkPage purpose="password-reset" token={(await params).token} />;
}
