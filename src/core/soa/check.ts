/** Argument checks of the SOA core; messages start with the field path. */

export function checkNumber(value: unknown, path: string, min = -Infinity, strict = false): number {
  if (typeof value !== 'number') throw new TypeError(`${path}: expected a number, got ${typeof value}`);
  if (!Number.isFinite(value)) throw new RangeError(`${path}: must be finite, got ${value}`);
  if (strict ? !(value > min) : !(value >= min)) {
    throw new RangeError(`${path}: must be ${strict ? '>' : '≥'} ${min}, got ${value}`);
  }
  return value;
}

export function checkPulse(value: unknown, path: string): void {
  if (value !== 'dc') checkNumber(value, path, 0, true);
}
