import { sql } from 'drizzle-orm';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import { runMigrations, type DbHandle } from '@/db/open';
import { drawerScheduleSchema } from '@/shared/schemas/drawer-schedule';
import { nestSawSchema } from '@/shared/schemas/saw';
import { inches } from '@/lib/units/length';
import { databaseBefore } from '../support/database-before';

/**
 * Lengths lost their `Mm` suffix (every length is mm). The migration renames the keys of the JSON stored the old way —
 * a drawer schedule's input, a nest request's saws, an audit event's data — so the code of today reads them. Rows are
 * written as the code before it wrote them, then the migration runs over them.
 */
let handle: DbHandle;

beforeAll(async () => {
  handle = await databaseBefore((tag) => tag.endsWith('_lengths-without-unit'), 'renames the lengths stored in JSON');
});
afterAll(async () => {
  await handle?.close();
});

const rows = async <T>(query: ReturnType<typeof sql>) => ((await handle.db.execute(query)) as unknown as { rows: T[] }).rows;

// As the code before wrote them: a ½″ lock-rabbet box 14″ × 5″ × 20″ with a grooved bottom, and a table saw.
const OLD_SCHEDULE = {
  label: 'Pantry drawers',
  quantity: 3,
  size: { from: 'box', widthMm: inches(14), heightMm: inches(5), depthMm: inches(20) },
  joint: { method: 'lock-rabbet' },
  thickness: { frontMm: inches(0.5), sideMm: inches(0.5) },
  bottom: { mount: 'groove', thicknessMm: 6, groove: { widthMm: 6.5, depthMm: 6, heightMm: 8 } },
  materials: { sides: 'Baltic birch' },
};
const OLD_SAW = {
  kind: 'table-saw',
  kindName: null,
  name: 'Cabinet saw',
  kerfMm: 3.175,
  ripCapacityMm: 762,
  crosscutCapacityMm: 610,
  maxPieceLengthMm: null,
  maxPieceWidthMm: null,
  maxStages: 3,
  firstStage: 'rip',
  minFenceWidthMm: 25.4,
};
const OLD_REQUEST = {
  parts: [{ id: 'side', quantity: 2, length: 500, width: 300, thickness: 18, material: 'Birch ply' }],
  stock: [{ id: 'sheet', kind: 'sheet', length: 2440, width: 1220, thickness: 18, material: 'Birch ply', count: null }],
  settings: { kerf: 3.175, saw: OLD_SAW, faceAreaMm2: 12 },
};

describe('the length-names migration on JSON written the old way', () => {
  test('renames every key ending in Mm, at any depth, and keeps the values, the order of lists and areas in mm²', async () => {
    const [shop] = await rows<{ id: string }>(sql`insert into shops (name) values ('Old names shop') returning id`);
    const [job] = await rows<{ id: string }>(sql`insert into jobs (shop_id, name) values (${shop.id}, 'Pantry') returning id`);
    const [schedule] = await rows<{ id: string }>(
      sql`insert into drawer_schedules (shop_id, job_id, label, input) values (${shop.id}, ${job.id}, 'Pantry drawers', ${JSON.stringify(OLD_SCHEDULE)}::jsonb) returning id`,
    );
    const [plan] = await rows<{ id: string }>(
      sql`insert into plans (shop_id, job_id, name, status, request, document) values (${shop.id}, ${job.id}, 'P', 'draft', ${JSON.stringify(OLD_REQUEST)}::jsonb, '{}') returning id`,
    );
    await handle.db.execute(
      sql`insert into audit_events (shop_id, action, entity, data) values (${shop.id}, 'part.update', 'part', ${JSON.stringify({ lengthMm: 500, tags: [{ widthMm: 1 }, { widthMm: 2 }] })}::jsonb)`,
    );

    await runMigrations(handle);

    const [{ input }] = await rows<{ input: unknown }>(sql`select input from drawer_schedules where id = ${schedule.id}`);
    expect(input).toEqual({
      ...OLD_SCHEDULE,
      size: { from: 'box', width: inches(14), height: inches(5), depth: inches(20) },
      thickness: { front: inches(0.5), side: inches(0.5) },
      bottom: { mount: 'groove', thickness: 6, groove: { width: 6.5, depth: 6, height: 8 } },
    });
    expect(drawerScheduleSchema.safeParse(input).success).toBe(true);

    const [{ request }] = await rows<{ request: typeof OLD_REQUEST }>(sql`select request from plans where id = ${plan.id}`);
    expect(request.parts).toEqual(OLD_REQUEST.parts);
    expect(request.settings.faceAreaMm2).toBe(12);
    const saw = nestSawSchema.parse(request.settings.saw);
    expect(saw).toMatchObject({ kerf: 3.175, ripCapacity: 762, crosscutCapacity: 610, maxPieceLength: null, minFenceWidth: 25.4 });

    const [{ data }] = await rows<{ data: unknown }>(sql`select data from audit_events where shop_id = ${shop.id}`);
    expect(data).toEqual({ length: 500, tags: [{ width: 1 }, { width: 2 }] });
  });
});
