import { createHardware, listHardware } from '@/db/queries/pricing';
import { route } from '@/server/api/route';
import { hardwareItemSchema } from '@/shared/schemas/pricing';

// GET /api/settings/hardware – the shop's hardware price list (prices: never the cutter)
export const GET = route({ permission: 'prices:read' }, async ({ scope }) => listHardware(scope));

// POST /api/settings/hardware – add an item to the price list (owner); 409 for a name already on it
export const POST = route({ permission: 'settings:write', body: hardwareItemSchema, status: 201 }, async ({ scope, body }) =>
  createHardware(scope, body),
);
