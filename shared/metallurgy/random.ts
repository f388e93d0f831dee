/**
 * Seeded pseudo-random source for every stochastic computation in the core.
 * mulberry32: a 32-bit generator with full period 2^32 (public-domain algorithm,
 * T. Ettinger 2017); ample for lattice sampling and fast enough for 64^3 lattices.
 * Never use Math.random in the core: a run must replay exactly from its seed.
 */
export type RandomSource = () => number;

export function createRandom(seed: number): RandomSource {
  let a = (Math.floor(seed) >>> 0) || 0x9e3779b9;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Standard normal deviate by the Box–Muller transform, from a seeded uniform source. */
export function normalDeviate(random: RandomSource): number {
  let u = 0;
  while (u === 0) u = random();
  const v = random();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}
