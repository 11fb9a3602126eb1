/** Plans for the saw-order tests, nested by the real engine from small invented requests. */
import { optimize } from '@/lib/nesting';
import { part, request, sheet } from '@/lib/nesting/test-support';
import { inches } from '@/lib/units/length';
import { nestRequestSchema, type NestRequest, type NestRequestInput } from '@/shared/schemas/nesting';

export async function nest(input: NestRequestInput) {
  const req: NestRequest = nestRequestSchema.parse(input);
  return { request: req, plan: await optimize(req) };
}

/** Strip count (derived, lib/nesting/RULES.md): a 48″ sheet, strips 11-7/8″ wide, 1/8″ kerf → 4 full-length strips. */
export const stripsRequest = () =>
  request([part('strip', inches(96), inches(11 + 7 / 8), { label: 'Shelf', quantity: 4 })], [sheet('s', inches(96), inches(48))], {
    kerf: inches(1 / 8),
  });

/** An invented small carcass on two 4 × 8 sheets, with trim, so trim cuts, crosscuts and offcuts all appear. */
export const carcassRequest = () =>
  request(
    [
      part('side', inches(34.5), inches(23), { label: 'Base side', quantity: 4 }),
      part('bottom', inches(34), inches(23), { label: 'Base bottom', quantity: 2 }),
      part('stretcher', inches(34), inches(4), { label: 'Stretcher', quantity: 4, grain: 'any' }),
    ],
    [sheet('ply', inches(96), inches(48))],
    { kerf: inches(1 / 8), trim: 6 },
  );
