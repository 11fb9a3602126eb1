import { getBuyingSettings, updateBuyingSettings } from '@/db/queries/purchase-orders';
import { route } from '@/server/api/route';
import { buyingSettingsPatchSchema } from '@/shared/schemas/purchase-order';

// GET /api/settings/buying – the details printed on purchase orders and the low-stock digest's time of day
export const GET = route({ permission: 'purchasing:read' }, async ({ scope }) => {
  return getBuyingSettings(scope);
});

// PATCH /api/settings/buying – change them (the digest's time is on the shop's clock; '' sends none)
export const PATCH = route({ permission: 'settings:write', body: buyingSettingsPatchSchema }, async ({ scope, body }) =>
  updateBuyingSettings(scope, body),
);
