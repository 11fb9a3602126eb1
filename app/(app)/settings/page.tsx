import type { Metadata } from 'next';
import { SettingsForm } from '@/components/settings/settings-form';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/session';

export const metadata: Metadata = { title: 'Shop settings' };

export default async function SettingsPage() {
  await requirePageUser('settings:write');
  return (
    <>
      <PageHeader title="Shop settings" lead="Units everyone sees, and the cutting defaults every new nest starts from." />
      <SettingsForm />
    </>
  );
}
