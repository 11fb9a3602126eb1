import { route } from '@/server/api/route';
import { stockOffers } from './stock-offers';

// GET /api/materials – the materials and thicknesses the stock room offers (sheets, boards, available offcuts), for pickers; no prices
export const GET = route({ permission: 'stock:read' }, async ({ db, user }) => stockOffers(db, user.shopId));
