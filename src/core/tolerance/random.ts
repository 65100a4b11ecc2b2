/**
 * Seeded pseudo-random numbers. mulberry32 (Tommy Ettinger, public domain; from memory) gives
 * uniform [0, 1); each run draws from its own stream seeded from (seed, run), so a sweep split
 * over workers in any way gives the same runs.
 */
export function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Seed of run `index`'s stream: a 32-bit integer hash of the pair (murmur3's finaliser; from memory). */
export function runSeed(seed: number, index: number): number {
  let h = (seed ^ Math.imul(index + 1, 0x9e3779b1)) >>> 0;
  h ^= h >>> 16;
  h = Math.imul(h, 0x85ebca6b);
  h ^= h >>> 13;
  h = Math.imul(h, 0xc2b2ae35);
  h ^= h >>> 16;
  return h >>> 0;
}

/** Standard normal deviate by the Box–Muller transform (Box & Muller, Ann. Math. Statist. 29, 1958). */
export function standardNormal(next: () => number): number {
  const u = 1 - next(); // (0, 1]: log(u) is finite
  const v = next();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}
