import { mulberry32 } from '@/core/tolerance/random';

/** Seeded pseudo-random numbers in [0, 1) for tests: the core's mulberry32 generator. */
export function seededRandom(seed: number): () => number {
  return mulberry32(seed);
}
