import { createSlideModel, listSlideModels } from '@/db/queries/slide-models';
import { route } from '@/server/api/route';
import { slideModelSchema } from '@/shared/schemas/slide-model';

// GET /api/slide-models – the shop's drawer slide models, as their makers specify them
export const GET = route({ permission: 'settings:read' }, async ({ scope }) => listSlideModels(scope));

// POST /api/slide-models – add a slide model (owner); refuses a second model of the same name (409)
export const POST = route({ permission: 'settings:write', body: slideModelSchema, status: 201 }, async ({ scope, body }) =>
  createSlideModel(scope, body),
);
