import Papa from 'papaparse';
import type { LengthUnit } from '@/lib/units/parse-length';
import { lengthInput } from '@/shared/schemas/units';
import { thicknessInput } from '@/shared/schemas/lumber';
import { thicknessToMm } from '@/lib/lumber/thickness';
import { stockItemSchema, type StockItemValues } from '@/shared/schemas/stock';
import type { StockCsvError } from '@/shared/wire/stock';

/**
 * Reading a stock file: one sheet or board size per row. Every bad row is named with its line and reasons, and
 * nothing is guessed: a row with any bad field is not imported. Header names are matched loosely (case, spaces,
 * a few common words) so a supplier's export can be used as it is.
 */
export const STOCK_CSV_COLUMNS = [
  'kind',
  'material',
  'thickness',
  'length',
  'width',
  'quantity',
  'cost',
  'actual thickness',
  'grain',
  'surfacing',
  'grade',
  'supplier',
  'location',
  'low stock at',
  'buyable',
] as const;
type Column = (typeof STOCK_CSV_COLUMNS)[number];

const ALIASES: Record<string, Column> = {
  type: 'kind',
  species: 'material',
  thick: 'thickness',
  nominal: 'thickness',
  'nominal thickness': 'thickness',
  qty: 'quantity',
  count: 'quantity',
  'on hand': 'quantity',
  price: 'cost',
  'cost each': 'cost',
  'cost per bf': 'cost',
  actual: 'actual thickness',
  'actual thickness mm': 'actual thickness',
  rack: 'location',
  'low stock': 'low stock at',
  'reorder at': 'low stock at',
  'can buy': 'buyable',
};
const REQUIRED: Column[] = ['kind', 'material', 'thickness', 'length', 'width', 'quantity'];

export interface StockCsvRow {
  /** 1-based line in the file, header included, as a spreadsheet shows it. */
  line: number;
  item: StockItemValues;
}
export type { StockCsvError };
export interface StockCsvResult {
  rows: StockCsvRow[];
  errors: StockCsvError[];
  /** Problems with the file itself (missing columns); when present no row is read. */
  fileErrors: string[];
}

const normalise = (h: string) =>
  h
    .trim()
    .toLowerCase()
    .replace(/[_\-.]+/g, ' ')
    .replace(/\s+/g, ' ')
    .replace(/\s*\(.*\)$/, '');
const column = (h: string): Column | undefined => {
  const n = normalise(h);
  return (STOCK_CSV_COLUMNS as readonly string[]).includes(n) ? (n as Column) : ALIASES[n];
};

const MONEY = /^\s*[$€£]?\s*(\d{1,9})(?:[.,](\d{1,2}))?\s*$/;
/** "94", "94.5", "$94.50" → 9450 cents; anything else is refused rather than guessed. */
export function parseMoneyCents(value: string): number | null {
  const m = MONEY.exec(value);
  if (!m) return null;
  return Number(m[1]) * 100 + Number((m[2] ?? '0').padEnd(2, '0'));
}

const YES = new Set(['yes', 'y', 'true', '1']);
const NO = new Set(['no', 'n', 'false', '0', '']);

type StockTable = { columns: (Column | undefined)[]; body: string[][] } | { fileErrors: string[] };

/** The file's header and rows, or the reason no row can be read. */
function readStockTable(csv: string): StockTable {
  return tableOf(Papa.parse<string[]>(csv.replace(/^\uFEFF/, ''), { skipEmptyLines: 'greedy' }).data);
}

/** The same, parsed a few hundred rows at a time with the event loop given back in between. */
function readStockTableInSlices(csv: string): Promise<StockTable> {
  return new Promise((resolve, reject) => {
    const data: string[][] = [];
    Papa.parse<string[]>(csv.replace(/^\uFEFF/, ''), {
      skipEmptyLines: 'greedy',
      step: (result, parser) => {
        data.push(result.data);
        if (data.length % 500 === 0) {
          parser.pause();
          setImmediate(() => parser.resume());
        }
      },
      complete: () => resolve(tableOf(data)),
      error: (error: Error) => reject(error),
    });
  });
}

function tableOf(data: string[][]): StockTable {
  const [header = [], ...body] = data;
  const columns = header.map(column);
  const missing = REQUIRED.filter((c) => !columns.includes(c));
  if (!body.length && !header.length) return { fileErrors: ['The file has no rows.'] };
  if (missing.length) {
    return {
      fileErrors: [`Missing column${missing.length > 1 ? 's' : ''}: ${missing.join(', ')}. Expected a header row naming ${REQUIRED.join(', ')}.`],
    };
  }
  return { columns, body };
}

type RowResult = { ok: true; row: StockCsvRow } | { ok: false; error: StockCsvError };

// The unit's length and thickness schemas, built once per unit rather than four times a row.
const PARSERS = new Map<LengthUnit, { length: ReturnType<typeof lengthInput>; thickness: ReturnType<typeof thicknessInput> }>();
function parsersFor(unit: LengthUnit) {
  let p = PARSERS.get(unit);
  if (!p) PARSERS.set(unit, (p = { length: lengthInput(unit), thickness: thicknessInput(unit) }));
  return p;
}

type Cell = (c: Column) => string;
type Note = (field: string, msg: string) => void;

/** One row checked: its item, or every reason it cannot be imported. */
function checkRow(cells: string[], columns: (Column | undefined)[], unit: LengthUnit, line: number): RowResult {
  const cell: Cell = (c) => {
    const at = columns.indexOf(c);
    return at < 0 ? '' : (cells[at] ?? '').trim();
  };
  const messages: string[] = [];
  const note: Note = (field, msg) => messages.push(`${field}: ${msg}`);

  if (!cell('material')) note('material', 'is empty');
  const kind = readKind(cell, note);
  const sizes = readSizes(cell, note, unit);
  const counts = readCounts(cell, note);
  const { grain, surfacing, buyable } = readDetails(cell, note);

  if (messages.length) return { ok: false, error: { line, messages } };
  const item = stockItemSchema.safeParse({
    kind,
    material: cell('material'),
    nominalThickness: cell('thickness'),
    ...sizes,
    grain,
    surfacing: kind === 'sheet' ? '' : surfacing,
    grade: cell('grade'),
    ...counts,
    supplier: cell('supplier'),
    location: cell('location'),
    buyable,
  });
  if (!item.success) return { ok: false, error: { line, messages: item.error.issues.map((is) => `${String(is.path[0] ?? 'row')}: ${is.message}`) } };
  return { ok: true, row: { line, item: item.data } };
}

function readKind(cell: Cell, note: Note): 'sheet' | 'board' | null {
  const text = cell('kind').toLowerCase();
  const kind = text.startsWith('sheet') ? 'sheet' : text.startsWith('board') || text === 'lumber' ? 'board' : null;
  if (!kind) note('kind', `"${cell('kind')}" is not sheet or board`);
  return kind;
}

/** Thickness (nominal, or the actual one when given), length and width, in the file's unit. */
function readSizes(cell: Cell, note: Note, unit: LengthUnit) {
  const parse = parsersFor(unit);
  const thickness = parse.thickness.safeParse(cell('thickness'));
  if (!thickness.success) note('thickness', thickness.error.issues[0].message);
  let measured = thickness.success ? thicknessToMm(thickness.data) : NaN;
  if (cell('actual thickness')) {
    const actual = parse.length.safeParse(cell('actual thickness'));
    if (actual.success) measured = actual.data;
    else note('actual thickness', actual.error.issues[0].message);
  }
  const length = parse.length.safeParse(cell('length'));
  if (!length.success) note('length', length.error.issues[0].message);
  const width = parse.length.safeParse(cell('width'));
  if (!width.success) note('width', width.error.issues[0].message);
  return { thickness: measured, length: length.data, width: width.data };
}

/** The count on hand (required), the low-stock mark and the cost. */
function readCounts(cell: Cell, note: Note) {
  const whole = (c: Column, fallback: number) => {
    const v = cell(c);
    if (!v) return fallback;
    if (!/^\d+$/.test(v)) {
      note(c, `"${v}" is not a whole number`);
      return fallback;
    }
    return Number(v);
  };
  const onHand = whole('quantity', NaN);
  if (!cell('quantity')) note('quantity', 'is empty');
  const lowStockAt = whole('low stock at', 0);
  const costText = cell('cost');
  const costCents = costText ? parseMoneyCents(costText) : 0;
  if (costCents === null) note('cost', `"${costText}" is not an amount of money`);
  return { onHand, lowStockAt, costCents };
}

/** Grain (grained unless the file says none), whether it can be bought, and a board's surfacing. */
function readDetails(cell: Cell, note: Note) {
  const grainText = cell('grain').toLowerCase();
  // Safe default: grained, so a part is never turned across the grain unless the file says the stock has none.
  const grain =
    !grainText || ['along-length', 'length', 'long', 'yes'].includes(grainText)
      ? 'along-length'
      : ['none', 'no', 'any'].includes(grainText)
        ? 'none'
        : null;
  if (!grain) note('grain', `"${cell('grain')}" is not along-length or none`);
  const buyableText = cell('buyable').toLowerCase();
  if (!YES.has(buyableText) && !NO.has(buyableText)) note('buyable', `"${cell('buyable')}" is not yes or no`);
  const surfacingText = cell('surfacing');
  const surfacing = ({ '': '', rough: 'rough', s2s: 'S2S', s4s: 'S4S' } as Record<string, string>)[surfacingText.toLowerCase()];
  if (surfacing === undefined) note('surfacing', `"${surfacingText}" is not rough, S2S or S4S`);
  return { grain, surfacing, buyable: YES.has(buyableText) };
}

/** Checks a stock file row by row, all at once (small files, tests). */
export function parseStockCsv(csv: string, unit: LengthUnit): StockCsvResult {
  const table = readStockTable(csv);
  if ('fileErrors' in table) return { rows: [], errors: [], fileErrors: table.fileErrors };
  const rows: StockCsvRow[] = [];
  const errors: StockCsvError[] = [];
  table.body.forEach((cells, i) => {
    const r = checkRow(cells, table.columns, unit, i + 2);
    if (r.ok) rows.push(r.row);
    else errors.push(r.error);
  });
  return { rows, errors, fileErrors: [] };
}

/** Rows checked between two yields to the event loop: a few milliseconds of work. */
const ROWS_PER_SLICE = 25;

/**
 * The same check for a request: it gives the event loop back every ROWS_PER_SLICE rows, so a 1 MB file does not
 * hold up every other request on the server (a health check answered 4.6 s late behind one before).
 */
export async function checkStockCsv(csv: string, unit: LengthUnit): Promise<StockCsvResult> {
  await yieldToEventLoop();
  const table = await readStockTableInSlices(csv);
  if ('fileErrors' in table) return { rows: [], errors: [], fileErrors: table.fileErrors };
  const rows: StockCsvRow[] = [];
  const errors: StockCsvError[] = [];
  for (let i = 0; i < table.body.length; i++) {
    if (i > 0 && i % ROWS_PER_SLICE === 0) await yieldToEventLoop();
    const r = checkRow(table.body[i], table.columns, unit, i + 2);
    if (r.ok) rows.push(r.row);
    else errors.push(r.error);
  }
  return { rows, errors, fileErrors: [] };
}

const yieldToEventLoop = () => new Promise<void>((resolve) => setImmediate(resolve));
