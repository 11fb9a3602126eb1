import { slideModels } from '@/db/schema';
import { nextNumber } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

/** A valid undermount model; each call its own name, since a shop keeps one model per name. */
const MODEL = () => ({
  kind: 'undermount',
  name: `Matrix slide ${nextNumber()}`,
  lengths: [300, 400, 500],
  widthRule: 'outside',
  widthDeduction: 10,
  maxSideThickness: 16,
  bottomRecess: 13,
  heightClearance: 20,
  rearClearance: 10,
});

const freshModel = async ({ db, mine }: AuthzFixtures) => {
  const [m] = await db
    .insert(slideModels)
    .values({ shopId: mine.id, ...MODEL() })
    .returning();
  return { id: m.id };
};

// Slide models are Shop settings: the owner keeps them; estimators and cutters read them (the schedule form does).
const ownerWrites = { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 };

export const rows: AuthzRow[] = [
  { route: '/api/slide-models', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  {
    route: '/api/slide-models',
    method: 'POST',
    get body() {
      return MODEL();
    },
    expect: { anonymous: 401, owner: 201, estimator: 403, cutter: 403, other: 201 },
  },
  {
    route: '/api/slide-models/[id]',
    method: 'PUT',
    target: freshModel,
    get body() {
      return MODEL();
    },
    expect: ownerWrites,
  },
  { route: '/api/slide-models/[id]', method: 'DELETE', target: freshModel, expect: ownerWrites },
];
