/** Argument checks of the rail-plan core; messages start with the field path. */

export function checkNumber(value: unknown, path: string, min = -Infinity, strict = false): number {
  if (typeof value !== 'number') throw new TypeError(`${path}: expected a number, got ${typeof value}`);
  if (!Number.isFinite(value)) throw new RangeError(`${path}: must be finite, got ${value}`);
  if (strict ? !(value > min) : !(value >= min)) {
    throw new RangeError(`${path}: must be ${strict ? '>' : '≥'} ${min}, got ${value}`);
  }
  return value;
}

export function checkArray(value: unknown, path: string, minLength = 0): unknown[] {
  if (!Array.isArray(value)) throw new TypeError(`${path}: expected an array`);
  if (value.length < minLength) throw new RangeError(`${path}: needs at least ${minLength} item${minLength === 1 ? '' : 's'}`);
  return value;
}
