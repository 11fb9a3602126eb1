import { z } from 'zod';
import { route } from '@/server/api/route';
import { listMovements } from '@/db/queries/stock';

const query = z.object({ stockItemId: z.uuid().optional(), offcutId: z.uuid().optional() });

// GET /api/stock/movements – the stock ledger, newest first, for the shop or one size or offcut
export const GET = route({ permission: 'stock:read', query }, async ({ scope, query }) => ({
  movements: await listMovements(scope, query),
}));
