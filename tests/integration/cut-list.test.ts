import Papa from 'papaparse';
import type { NextRequest } from 'next/server';
import { beforeAll, describe, expect, test } from 'vitest';
import type { DbHandle } from '@/db/open';
import { parts, stockItems } from '@/db/schema';
import { eq } from 'drizzle-orm';
import { inches } from '@/lib/units/length';
import { setUpTwoShopDatabase, type TwoShops } from '../support/two-shop-database';
import { request, type TestUser } from '../support/fixtures';
import * as partsRoute from '@/app/api/jobs/[id]/parts/route';
import * as partRoute from '@/app/api/jobs/[id]/parts/[partId]/route';
import * as previewRoute from '@/app/api/jobs/[id]/cut-list/preview/route';
import * as importRoute from '@/app/api/jobs/[id]/cut-list/import/route';
import * as exportRoute from '@/app/api/jobs/[id]/cut-list/export/route';
import * as materialsRoute from '@/app/api/materials/route';

let handle: DbHandle;
let fx: TwoShops;
setUpTwoShopDatabase((app) => ({ handle, fx } = app));
beforeAll(async () => {
  await handle.db.insert(stockItems).values([
    { shopId: fx.mine.id, kind: 'sheet', material: 'MDF', nominalThickness: '18 mm', thickness: 18, length: 2440, width: 1220, onHand: 3 },
    { shopId: fx.theirs.id, kind: 'sheet', material: 'Secret walnut ply', nominalThickness: '3/4"', thickness: 19, length: 2440, width: 1220 },
  ]);
});

type Handler = (req: NextRequest, ctx: { params: Promise<Record<string, string | string[]>> }) => Promise<Response>;
async function call(handler: Handler, url: string, params: Record<string, string>, opts: { method?: string; body?: unknown; user?: TestUser } = {}) {
  const res = await handler(await request(url, { user: fx.estimator, ...opts }), { params: Promise.resolve(params) });
  const text = await res.text();
  let json: any = null; // eslint-disable-line @typescript-eslint/no-explicit-any -- JSON of many shapes
  try {
    json = JSON.parse(text);
  } catch {
    /* CSV */
  }
  return { status: res.status, json, text, headers: res.headers };
}
const jobParams = () => ({ id: fx.myJob.id });
const countParts = async (jobId = fx.myJob.id) => (await handle.db.select().from(parts).where(eq(parts.jobId, jobId))).length;

const UPLOAD = (rows: string[][]) => ({
  columns: ['label', 'quantity', 'length', 'width', 'thickness', 'material', 'notes'],
  rows: rows.map((cells, i) => ({ line: i + 2, cells })),
  unit: 'in',
});

describe('typing rows into the cut list', () => {
  test('a row is added, changed, listed in order and deleted, with the sizes kept in mm', async () => {
    const added = await call(partsRoute.POST, '/api/jobs/x/parts', jobParams(), {
      method: 'POST',
      body: { label: 'Shelf', quantity: 2, length: inches(30), width: inches(11.25), thickness: 18, material: 'MDF', grain: 'any' },
    });
    expect(added.status).toBe(201);
    expect(added.json).toMatchObject({ label: 'Shelf', quantity: 2, grain: 'any', drawerScheduleId: null, notes: '' });

    const changed = await call(
      partRoute.PATCH,
      '/api/jobs/x/parts/y',
      { ...jobParams(), partId: added.json.id },
      { method: 'PATCH', body: { quantity: 3, notes: 'edge band one long edge' } },
    );
    expect(changed.json).toMatchObject({ quantity: 3, notes: 'edge band one long edge', length: inches(30) });

    const list = await call(partsRoute.GET, '/api/jobs/x/parts', jobParams());
    expect(list.json.map((p: { label: string }) => p.label)).toContain('Shelf');

    expect((await call(partRoute.DELETE, '/api/jobs/x/parts/y', { ...jobParams(), partId: added.json.id }, { method: 'DELETE' })).status).toBe(200);
    expect((await call(partsRoute.GET, '/api/jobs/x/parts', jobParams())).json.find((p: { id: string }) => p.id === added.json.id)).toBeUndefined();
  });

  test('a bad cell is refused with its field named, and nothing changes', async () => {
    const added = await call(partsRoute.POST, '/api/jobs/x/parts', jobParams(), {
      method: 'POST',
      body: { label: 'Rail', quantity: 1, length: 500, width: 80, thickness: 18, material: 'MDF' },
    });
    const bad = await call(
      partRoute.PATCH,
      '/api/jobs/x/parts/y',
      { ...jobParams(), partId: added.json.id },
      { method: 'PATCH', body: { quantity: 0, width: -3 } },
    );
    expect(bad.status).toBe(422);
    expect(Object.keys(bad.json.fields).sort()).toEqual(['quantity', 'width']);
    const [row] = await handle.db.select().from(parts).where(eq(parts.id, added.json.id));
    expect(row).toMatchObject({ quantity: 1, width: 80 });
  });

  test("another shop's job and parts do not exist from here", async () => {
    const res = await call(
      partsRoute.POST,
      '/api/jobs/x/parts',
      { id: fx.theirJob.id },
      { method: 'POST', body: { label: 'x', quantity: 1, length: 1, width: 1, thickness: 1, material: 'MDF' } },
    );
    expect(res.status).toBe(404);
    expect(await countParts(fx.theirJob.id)).toBe(0);
  });
});

describe('uploading a cut list', () => {
  const GOOD = ['Side', '2', '30', '23-1/4', '3/4', 'MDF', ''];
  const BAD = ['Shelf', 'two', '30', '11 1/4', '3/4', 'MDF', ''];

  test('the preview lists each bad row with its reason and each row the stock room cannot supply, and writes nothing', async () => {
    const before = await countParts();
    const res = await call(previewRoute.POST, '/api/jobs/x/cut-list/preview', jobParams(), {
      method: 'POST',
      body: UPLOAD([GOOD, BAD, ['Top', '1', '30', '12', '18 mm', 'Secret walnut ply', '']]),
    });
    expect(res.status).toBe(200);
    expect(res.json).toMatchObject({ validCount: 2, invalidCount: 1 });
    expect(res.json.rows[1]).toEqual({ line: 3, ok: false, problems: [{ field: 'quantity', message: 'Quantity “two” is not a whole number.' }] });
    // 3/4″ MDF is the shop's 18 mm sheet (nominal and actual differ); another shop's stock is invisible.
    expect(res.json.rows[0].part.thickness).toBe(18);
    expect(res.json.warnings).toEqual([{ line: 4, message: expect.stringContaining('The stock room has no Secret walnut ply at all') }]);
    expect(await countParts()).toBe(before);
  });

  test('importing a file with a bad row writes nothing and names the row', async () => {
    const before = await countParts();
    const res = await call(importRoute.POST, '/api/jobs/x/cut-list/import', jobParams(), {
      method: 'POST',
      body: { ...UPLOAD([GOOD, BAD]), mode: 'all' },
    });
    expect(res.status).toBe(422);
    expect(res.json.error).toContain('1 of 2 rows have problems, so nothing was imported');
    expect(res.json.fields).toEqual({ 'rows.3': ['Quantity: Quantity “two” is not a whole number.'] });
    expect(await countParts()).toBe(before);
  });

  test('importing only the valid rows writes them all in one go and reports the skipped lines', async () => {
    const before = await countParts();
    const res = await call(importRoute.POST, '/api/jobs/x/cut-list/import', jobParams(), {
      method: 'POST',
      body: { ...UPLOAD([GOOD, BAD, GOOD]), mode: 'valid-only' },
    });
    expect(res.status).toBe(201);
    expect(res.json).toEqual({ imported: 2, skipped: 1, skippedLines: [3] });
    expect(await countParts()).toBe(before + 2);
  });

  test('an upload over the row limit is refused whole', async () => {
    const res = await call(importRoute.POST, '/api/jobs/x/cut-list/import', jobParams(), {
      method: 'POST',
      body: UPLOAD(Array.from({ length: 1001 }, () => GOOD)),
    });
    expect(res.status).toBe(422);
    expect(res.json.fields.rows[0]).toContain('At most 1,000 rows');
  });

  test('an upload missing a required column is refused, naming the column', async () => {
    const res = await call(previewRoute.POST, '/api/jobs/x/cut-list/preview', jobParams(), {
      method: 'POST',
      body: { columns: ['label', 'quantity'], rows: [{ line: 2, cells: ['a', '1'] }], unit: 'mm' },
    });
    expect(res.status).toBe(422);
    expect(res.json.fields.columns[0]).toBe('Map a column to Length, Width, Thickness, Material.');
  });
});

describe('exporting the cut list', () => {
  test('the CSV download is in the shop’s unit with formula-looking cells neutralised (OWASP CSV Injection)', async () => {
    await call(partsRoute.POST, '/api/jobs/x/parts', jobParams(), {
      method: 'POST',
      body: {
        label: '=HYPERLINK("http://example.invalid")',
        quantity: 1,
        length: inches(19.75),
        width: inches(4),
        thickness: inches(0.5),
        material: 'MDF',
      },
    });
    const res = await call(exportRoute.GET, '/api/jobs/x/cut-list/export', jobParams(), { user: fx.cutter });
    expect(res.status).toBe(200);
    expect(res.headers.get('content-type')).toBe('text/csv; charset=utf-8');
    expect(res.headers.get('content-disposition')).toBe('attachment; filename="birchwood-pantry-cut-list.csv"');
    const rows = Papa.parse<string[]>(res.text.replace(/^\uFEFF/, '').trim()).data;
    expect(rows[0][2]).toBe('Length (in)');
    const evil = rows.find((r) => r[0].includes('HYPERLINK'))!;
    expect(evil.slice(0, 5)).toEqual(['\'=HYPERLINK("http://example.invalid")', '1', '19-3/4"', '4"', '1/2"']);
  });
});

describe('materials for pickers', () => {
  test("lists this shop's stock materials and thicknesses, never another shop's, and no prices", async () => {
    const res = await call(materialsRoute.GET, '/api/materials', {}, { user: fx.cutter });
    expect(res.json).toEqual([{ material: 'MDF', kind: 'sheet', thickness: 18, nominal: '18 mm' }]);
  });
});
