/**
 * Parser for the standard two-dimensional bin packing instance file used by the bound tests and the benchmark.
 * One instance a line: `name;n;W;H;w,h[,count];w,h[,count];…` with positive integer sizes; blank lines and lines
 * starting with `#` are ignored. Any malformed line is an error naming the line and the field — nothing is skipped.
 */
export interface InstanceItem {
  w: number;
  h: number;
}

export interface BinPackingInstance {
  name: string;
  /** Class number 1–10 read from names like `cl07_040_03`; null when the name does not follow that pattern. */
  cls: number | null;
  bin: { w: number; h: number };
  /** One entry per item: an item with a count of k appears k times. */
  items: InstanceItem[];
}

export class InstanceParseError extends Error {
  constructor(
    readonly line: number,
    message: string,
  ) {
    super(`line ${line}: ${message}`);
    this.name = 'InstanceParseError';
  }
}

function positiveInt(text: string, what: string, line: number): number {
  const trimmed = text.trim();
  if (!/^\d+$/.test(trimmed) || Number(trimmed) <= 0) {
    throw new InstanceParseError(line, `${what} must be a positive integer, got "${text}"`);
  }
  return Number(trimmed);
}

export function parseInstanceLine(text: string, line = 1): BinPackingInstance {
  const fields = text.trim().split(';');
  if (fields.length < 4) {
    throw new InstanceParseError(line, `expected "name;n;W;H;w,h;…", got ${fields.length} field(s)`);
  }
  const [rawName, rawN, rawW, rawH, ...rawItems] = fields;
  const name = rawName.trim();
  if (name === '') throw new InstanceParseError(line, 'instance name is empty');
  const n = positiveInt(rawN, 'item count n', line);
  const bin = { w: positiveInt(rawW, 'bin width W', line), h: positiveInt(rawH, 'bin height H', line) };

  const items: InstanceItem[] = [];
  rawItems.forEach((raw, k) => {
    // A trailing ";" leaves one empty field; anything else empty is a mistake worth reporting.
    if (raw.trim() === '' && k === rawItems.length - 1) return;
    const parts = raw.split(',');
    if (parts.length < 2 || parts.length > 3) {
      throw new InstanceParseError(line, `item ${k + 1} must be "w,h" or "w,h,count", got "${raw}"`);
    }
    const w = positiveInt(parts[0], `item ${k + 1} width`, line);
    const h = positiveInt(parts[1], `item ${k + 1} height`, line);
    const count = parts.length === 3 ? positiveInt(parts[2], `item ${k + 1} count`, line) : 1;
    for (let c = 0; c < count; c++) items.push({ w, h });
  });
  if (items.length !== n) {
    throw new InstanceParseError(line, `instance ${name} declares n = ${n} but lists ${items.length} item(s)`);
  }
  const match = /^cl(\d+)_/i.exec(name);
  return { name, cls: match ? Number(match[1]) : null, bin, items };
}

export function parseInstances(text: string): BinPackingInstance[] {
  const out: BinPackingInstance[] = [];
  const seen = new Set<string>();
  text.split(/\r?\n/).forEach((raw, i) => {
    const trimmed = raw.trim();
    if (trimmed === '' || trimmed.startsWith('#')) return;
    const instance = parseInstanceLine(trimmed, i + 1);
    if (seen.has(instance.name)) throw new InstanceParseError(i + 1, `instance name ${instance.name} appears twice`);
    seen.add(instance.name);
    out.push(instance);
  });
  return out;
}
