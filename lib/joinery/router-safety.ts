import { inches, type Mm } from '@/lib/units/length';

/** Shown on every setup card. General cautions only: the machine's manual and local rules come first. */
export const ROUTER_TABLE_CAUTIONS: readonly string[] = [
  'Read and follow the router’s and router table’s manuals; they, local codes and licensed practice take precedence over these notes.',
  'Unplug the router before changing bits or adjusting bit height.',
  'Keep the bit guard in place; where it cannot be used, hold the work with featherboards.',
  'Use push blocks or push sticks; never bring a hand near the bit, and never feed freehand against a bare bit.',
  'Feed against the bit’s rotation, and rout narrow or short parts with a backer or sled.',
  'Large bits in a router table only, at reduced speed: up to 25 mm (1″) 24,000 rpm; 25–50 mm (1–2″) 18,000; 50–63 mm (2–2½″) 16,000; 63–89 mm (2½–3½″) 12,000.',
  'Wear eye and hearing protection, and collect the dust.',
  'Make test cuts in scrap of the same thickness before cutting parts.',
];

/** Highest speed for a router bit of this diameter [CP]; null above 3½″, where the bit maker must say. */
export function maxRouterSpeedRpm(bitDiameter: Mm): number | null {
  // NaN would fall through every row and read as "past 3½″"; a negative diameter as the fastest speed.
  if (typeof bitDiameter !== 'number' || !Number.isFinite(bitDiameter) || bitDiameter <= 0)
    throw new RangeError(`A bit diameter must be a positive length (got ${String(bitDiameter)}).`);
  const row = ROUTER_BIT_SPEEDS.find((r) => bitDiameter <= r.upToDiameter + 1e-9);
  return row ? row.maxRpm : null;
}

const ROUTER_BIT_SPEEDS = [
  { upToDiameter: inches(1), maxRpm: 24_000 },
  { upToDiameter: inches(2), maxRpm: 18_000 },
  { upToDiameter: inches(2.5), maxRpm: 16_000 },
  { upToDiameter: inches(3.5), maxRpm: 12_000 },
] as const;
