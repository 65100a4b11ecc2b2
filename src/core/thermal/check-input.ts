/** Argument checks shared by the thermal core; messages start with the field path. */

/** Throws unless value is a finite number ≥ min (or > min when strict). */
export function checkNumber(value: unknown, path: string, min = -Infinity, strict = false): number {
  if (typeof value !== 'number') throw new TypeError(`${path}: expected a number, got ${describe(value)}`);
  if (!Number.isFinite(value)) throw new RangeError(`${path}: must be finite, got ${value}`);
  if (strict ? !(value > min) : !(value >= min)) {
    throw new RangeError(`${path}: must be ${strict ? '>' : '≥'} ${min}, got ${value}`);
  }
  return value;
}

/** Throws unless value is an integer index in [0, length). */
export function checkIndex(value: unknown, path: string, length: number): number {
  if (typeof value !== 'number' || !Number.isInteger(value)) {
    throw new TypeError(`${path}: expected an integer index, got ${describe(value)}`);
  }
  if (value < 0 || value >= length) throw new RangeError(`${path}: index ${value} out of range 0…${length - 1}`);
  return value;
}

/** Throws unless every entry of a vector is finite and its length is as expected. */
export function checkVector(values: ArrayLike<number> | undefined, path: string, length: number): void {
  if (values == null || typeof values.length !== 'number') {
    throw new TypeError(`${path}: expected an array of ${length} numbers`);
  }
  if (values.length !== length) throw new RangeError(`${path}: expected ${length} values, got ${values.length}`);
  for (let i = 0; i < length; i++) {
    const v = values[i];
    if (typeof v !== 'number') throw new TypeError(`${path}[${i}]: expected a number, got ${describe(v)}`);
    if (!Number.isFinite(v)) throw new RangeError(`${path}[${i}]: must be finite, got ${v}`);
  }
}

export function describe(value: unknown): string {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  return typeof value === 'string' ? `"${value}"` : typeof value;
}
