/** A seeded pseudo-random source: the packer never calls Math.random, so one seed always gives one result. */
export type Rng = () => number;

/** mulberry32: tiny, fast, good enough to shuffle item orders (not for anything cryptographic). */
export function mulberry32(seed: number): Rng {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Uniform integer in [0, n). */
export const randInt = (rng: Rng, n: number) => Math.floor(rng() * n);
