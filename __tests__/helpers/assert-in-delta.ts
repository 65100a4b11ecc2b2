/** Shared numeric assertions: absolute and relative closeness, with the label in the failure. */

/** Fails unless |actual − expected| ≤ tol. */
export function assertInDelta(actual: number, expected: number, tol: number, label = 'value'): void {
  const error = Math.abs(actual - expected);
  if (!(error <= tol)) {
    throw new Error(`${label}: expected ${expected} ± ${tol}, got ${actual} (off by ${error})`);
  }
}

/** Fails unless |actual − expected| ≤ relTol · |expected| (plus absTol, default 0). */
export function assertInRelDelta(actual: number, expected: number, relTol: number, label = 'value', absTol = 0): void {
  const error = Math.abs(actual - expected);
  const allowed = relTol * Math.abs(expected) + absTol;
  if (!(error <= allowed)) {
    throw new Error(`${label}: expected ${expected} within ${relTol} relative, got ${actual} (relative error ${error / Math.abs(expected)})`);
  }
}
