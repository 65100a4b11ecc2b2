/** Numeric checks with a message naming the quantity (local until a shared helper exists). */
export function assertNear(actual: number, expected: number, tolerance: number, label: string): void {
  if (!(Math.abs(actual - expected) <= tolerance)) {
    throw new Error(`${label}: expected ${expected} ± ${tolerance}, got ${actual} (off by ${actual - expected})`);
  }
}

/** |actual / expected − 1| ≤ relTolerance. */
export function assertRelative(actual: number, expected: number, relTolerance: number, label: string): void {
  if (!(Math.abs(actual / expected - 1) <= relTolerance)) {
    throw new Error(`${label}: expected ${expected} within ${relTolerance * 100} %, got ${actual} (ratio ${actual / expected})`);
  }
}
