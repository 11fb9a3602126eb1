import { route } from '@/server/api/route';
import { listCatalogue } from '@/db/queries/stock';

// GET /api/catalogue – sizes the shop can buy (stock sizes marked buyable), with prices: what the nesting engine may buy
export const GET = route({ permission: 'prices:read' }, async ({ scope }) => ({ sizes: await listCatalogue(scope) }));
