import type { PricingSettings } from '@/shared/schemas/pricing';
import type { Saw } from '@/shared/schemas/saw';
import type { SetupCard } from '@/shared/schemas/setup-card';
import type { SlideModel } from '@/shared/schemas/slide-model';

/** A saw of Shop settings, as stored. */
export interface SavedSaw extends Saw {
  id: string;
  updatedAt: string;
}

/** A drawer slide model of Shop settings, as stored. */
export interface SavedSlideModel extends SlideModel {
  id: string;
  updatedAt: string;
}

/** A machine setup for a joint and stock thickness, as stored. */
export interface SavedSetupCard extends SetupCard {
  id: string;
  updatedAt: string;
}

/** The shop's pricing settings with the currency they are in. */
export interface PricingView {
  currency: string;
  pricing: PricingSettings;
}
