/**
 * Part colours on the bench: each drawer schedule (or, without one, each material) gets a calm tone of our own
 * palette, picked by a stable hash so the same schedule keeps its colour between visits.
 */
export const PART_TONES = ['#e9cfa8', '#cfe0cf', '#f3dfb0', '#d9d2e6', '#f0cdc2', '#c9dde3', '#e6dcc0', '#d7e4bd'] as const;

export const BENCH_COLORS = {
  stock: '#ffffff',
  waste: '#ece6da',
  offcut: '#e3efe4',
  offcutEdge: '#4f7a5a',
  partEdge: '#4a4a50',
  selected: '#a86a2c',
  problem: '#a8432f',
  locked: '#2a2a2d',
  text: '#2a2a2d',
  mute: '#7b7a80',
} as const;

function hash(text: string): number {
  let h = 2166136261;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 16777619);
  return h >>> 0;
}

/** The fill for a part of this drawer schedule (`group`) or, without one, this material and thickness. */
export const partTone = (group: string | undefined, material: string, thickness = 0) =>
  PART_TONES[hash(group ? `g:${group}` : `m:${material.trim().toLowerCase()}:${thickness.toFixed(1)}`) % PART_TONES.length];
