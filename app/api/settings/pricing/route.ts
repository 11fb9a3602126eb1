import { getPricing, setPricing } from '@/db/queries/pricing';
import { route } from '@/server/api/route';
import { pricingSettingsSchema } from '@/shared/schemas/pricing';

// GET /api/settings/pricing – hourly rates, labour minutes, markups, tax, deposit, validity, terms, offcut valuation (prices: never the cutter)
export const GET = route({ permission: 'prices:read' }, async ({ scope }) => {
  return getPricing(scope);
});

// PUT /api/settings/pricing – replace the shop's pricing settings (owner)
export const PUT = route({ permission: 'settings:write', body: pricingSettingsSchema }, async ({ scope, body }) => {
  return setPricing(scope, body);
});
