import { createSetupCard, listSetupCards } from '@/db/queries/setup-cards';
import { route } from '@/server/api/route';
import { setupCardSchema } from '@/shared/schemas/setup-card';

// GET /api/setup-cards – the shop's saved machine setups per joint and stock thickness
export const GET = route({ permission: 'jobs:read' }, async ({ scope }) => listSetupCards(scope));

// POST /api/setup-cards – save a setup card for a joint and stock thickness
export const POST = route({ permission: 'cutlist:write', body: setupCardSchema, status: 201 }, async ({ scope, body }) =>
  createSetupCard(scope, body),
);
