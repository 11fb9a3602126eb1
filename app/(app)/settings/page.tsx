import type { Metadata } from 'next';
import { SettingsForm } from '@/components/settings/settings-form';
import { PricingSection } from '@/components/settings/pricing-section';
import { SlideModelsSection } from '@/components/settings/slide-models-section';
import { SawsSection } from '@/components/settings/saws-section';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/session';

export const metadata: Metadata = { title: 'Shop settings' };

export default async function SettingsPage() {
  await requirePageUser('settings:write');
  return (
    <>
      <PageHeader
        title="Shop settings"
        lead="Units everyone sees, the cutting defaults every new nest starts from, the saws plans are cut on, the drawer slides boxes are sized on, and the pricing quotes start from."
      />
      <SettingsForm />
      <SawsSection />
      <SlideModelsSection />
      <PricingSection />
    </>
  );
}
