/** Argument checks of the heatsink core: each message starts with the field path. */

export function describe(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  return typeof value === 'string' ? `"${value}"` : typeof value;
}

/** A finite number, else TypeError / RangeError naming the field. */
export function checkFinite(value: unknown, path: string): number {
  if (typeof value !== 'number') throw new TypeError(`${path}: expected a number, got ${describe(value)}`);
  if (!Number.isFinite(value)) throw new RangeError(`${path}: must be finite, got ${value}`);
  return value;
}

/** A finite number > 0. */
export function checkPositive(value: unknown, path: string): number {
  const v = checkFinite(value, path);
  if (!(v > 0)) throw new RangeError(`${path}: must be > 0, got ${v}`);
  return v;
}

/** A finite number ≥ 0. */
export function checkNonNegative(value: unknown, path: string): number {
  const v = checkFinite(value, path);
  if (!(v >= 0)) throw new RangeError(`${path}: must be ≥ 0, got ${v}`);
  return v;
}

/** A finite number in [min, max]. */
export function checkRange(value: unknown, path: string, min: number, max: number): number {
  const v = checkFinite(value, path);
  if (!(v >= min && v <= max)) throw new RangeError(`${path}: must lie in ${min}…${max}, got ${v}`);
  return v;
}

/** An integer ≥ min. */
export function checkInteger(value: unknown, path: string, min: number): number {
  const v = checkFinite(value, path);
  if (!Number.isInteger(v)) throw new RangeError(`${path}: must be a whole number, got ${v}`);
  if (v < min) throw new RangeError(`${path}: must be ≥ ${min}, got ${v}`);
  return v;
}

export function checkObject(value: unknown, path: string): Record<string, unknown> {
  if (value == null || typeof value !== 'object' || Array.isArray(value)) {
    throw new TypeError(`${path}: expected an object, got ${describe(value)}`);
  }
  return value as Record<string, unknown>;
}

export function checkArray(value: unknown, path: string, minLength = 0): unknown[] {
  if (!Array.isArray(value)) throw new TypeError(`${path}: expected an array, got ${describe(value)}`);
  if (value.length < minLength) throw new RangeError(`${path}: needs at least ${minLength} entr${minLength === 1 ? 'y' : 'ies'}`);
  return value;
}

export function checkString(value: unknown, path: string): string {
  if (typeof value !== 'string' || value.length === 0) throw new TypeError(`${path}: expected a non-empty string, got ${describe(value)}`);
  return value;
}
