import { getShopSettings, updateShopSettings } from '@/db/queries/shops';
import { notFound } from '@/server/api/errors';
import { route } from '@/server/api/route';
import { shopSettingsPatchSchema } from '@/shared/schemas/shop';

// GET /api/settings – the shop's units and cutting defaults
export const GET = route({ permission: 'settings:read' }, async ({ scope }) => {
  return (await getShopSettings(scope)) ?? Promise.reject(notFound('The shop'));
});

// PATCH /api/settings – change units, kerf, trim, minimum offcut, waste allowance
export const PATCH = route({ permission: 'settings:write', body: shopSettingsPatchSchema }, async ({ scope, body }) =>
  updateShopSettings(scope, body),
);
