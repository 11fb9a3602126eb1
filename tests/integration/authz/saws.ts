import { saws } from '@/db/schema';
import { nextNumber } from '../../support/unique';
import type { AuthzFixtures, AuthzRow } from './types';

/** A valid table saw; each call its own name, since a shop keeps one saw per name. */
const SAW = () => ({
  kind: 'table-saw',
  name: `Matrix saw ${nextNumber()}`,
  kerf: 3.2,
  ripCapacity: 762,
  crosscutCapacity: 610,
  maxPieceLength: null,
  maxPieceWidth: null,
  maxStages: 3,
  firstStage: 'rip',
  minFenceWidth: 25.4,
});

const freshSaw = async ({ db, mine }: AuthzFixtures) => {
  const [s] = await db
    .insert(saws)
    .values({ shopId: mine.id, ...SAW() })
    .returning();
  return { id: s.id };
};

// Saws are Shop settings: the owner keeps them; estimators (the nest panel) and cutters read them.
const ownerWrites = { anonymous: 401, owner: 200, estimator: 403, cutter: 403, other: 404 };

export const rows: AuthzRow[] = [
  { route: '/api/saws', method: 'GET', expect: { anonymous: 401, owner: 200, estimator: 200, cutter: 200, other: 200 } },
  {
    route: '/api/saws',
    method: 'POST',
    get body() {
      return SAW();
    },
    expect: { anonymous: 401, owner: 201, estimator: 403, cutter: 403, other: 201 },
  },
  {
    route: '/api/saws/[id]',
    method: 'PUT',
    target: freshSaw,
    get body() {
      return SAW();
    },
    expect: ownerWrites,
  },
  { route: '/api/saws/[id]', method: 'DELETE', target: freshSaw, expect: ownerWrites },
];
