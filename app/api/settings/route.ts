import { getShopSettings, updateShopSettings } from '@/db/queries/shops';
import { route } from '@/server/api/route';
import { shopSettingsPatchSchema } from '@/shared/schemas/shop';

// GET /api/settings – the shop's units and cutting defaults
export const GET = route({ permission: 'settings:read' }, async ({ scope }) => {
  return getShopSettings(scope);
});

// PATCH /api/settings – change units, kerf, trim, minimum offcut, waste allowance
export const PATCH = route({ permission: 'settings:write', body: shopSettingsPatchSchema }, async ({ scope, body }) =>
  updateShopSettings(scope, body),
);
