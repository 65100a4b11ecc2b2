/**
 * Fails unless |actual − expected| ≤ delta, with a message that shows all three (jest's
 * toBeCloseTo only takes decimal digits, which does not fit values far from 1).
 */
export function assertInDelta(actual: number, expected: number, delta: number, what = 'value'): void {
  if (!Number.isFinite(delta) || delta < 0) throw new RangeError(`delta: must be finite and ≥ 0, got ${delta}`);
  if (Number.isNaN(actual) || !(Math.abs(actual - expected) <= delta)) {
    throw new Error(`${what}: expected ${expected} ± ${delta}, got ${actual} (off by ${actual - expected})`);
  }
}

/** assertInDelta with the tolerance as a fraction of |expected|. */
export function assertRelative(actual: number, expected: number, rel: number, what = 'value'): void {
  assertInDelta(actual, expected, rel * Math.abs(expected), what);
}
