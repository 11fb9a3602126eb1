import { createSaw, listSaws } from '@/db/queries/saws';
import { route } from '@/server/api/route';
import { sawSchema } from '@/shared/schemas/saw';

// GET /api/saws – the shop's saws (the profiles a nest keeps to), the nest's default first
export const GET = route({ permission: 'settings:read' }, async ({ scope }) => listSaws(scope));

// POST /api/saws – add a saw (owner); refuses a second saw of the same name (409)
export const POST = route({ permission: 'settings:write', body: sawSchema, status: 201 }, async ({ scope, body }) => createSaw(scope, body));
