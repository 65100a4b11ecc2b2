/**
 * Small readers that check one field of a plain JSON object and throw an error naming the
 * field's full path (`devices[1].package.terms[0].tauS`) and the reason.
 */

export type Obj = Record<string, unknown>;

export const fieldPath = (base: string, key: string | number): string =>
  typeof key === 'number' ? `${base}[${key}]` : base ? `${base}.${key}` : key;

export function typeFail(path: string, reason: string): never {
  throw new TypeError(`${path || 'study'}: ${reason}`);
}

export function rangeFail(path: string, reason: string): never {
  throw new RangeError(`${path || 'study'}: ${reason}`);
}

const describe = (value: unknown): string => {
  if (value === null) return 'null';
  if (Array.isArray(value)) return 'an array';
  if (typeof value === 'string') return `the text ${JSON.stringify(value.length > 40 ? `${value.slice(0, 40)}…` : value)}`;
  if (typeof value === 'number') return String(value);
  return `a ${typeof value}`;
};

export function asObject(value: unknown, path: string): Obj {
  if (value === undefined) typeFail(path, 'is required');
  if (typeof value !== 'object' || value === null || Array.isArray(value)) {
    typeFail(path, `must be an object, got ${describe(value)}`);
  }
  return value as Obj;
}

/** Rejects keys outside `allowed`: a misspelt optional field would otherwise be ignored silently. */
export function onlyKeys(obj: Obj, allowed: readonly string[], path: string): void {
  for (const key of Object.keys(obj)) {
    if (!allowed.includes(key)) typeFail(fieldPath(path, key), `unknown field (allowed here: ${allowed.join(', ')})`);
  }
}

export function asArray(value: unknown, path: string, minLength = 0): unknown[] {
  if (value === undefined) typeFail(path, 'is required');
  if (!Array.isArray(value)) typeFail(path, `must be an array, got ${describe(value)}`);
  if (value.length < minLength) rangeFail(path, `must hold at least ${minLength} item${minLength === 1 ? '' : 's'}`);
  return value;
}

export type NumberRule = {
  /** Smallest value allowed; with `exclusive` the value must lie above it. */
  min?: number;
  exclusive?: boolean;
  max?: number;
  integer?: boolean;
  unit?: string;
};

export function asNumber(value: unknown, path: string, rule: NumberRule = {}): number {
  if (typeof value !== 'number') typeFail(path, `must be a number, got ${describe(value)}`);
  if (!Number.isFinite(value)) rangeFail(path, `must be a finite number, got ${value}`);
  const unit = rule.unit ? ` ${rule.unit}` : '';
  if (rule.integer && !Number.isInteger(value)) rangeFail(path, `must be a whole number, got ${value}`);
  if (rule.min !== undefined) {
    if (rule.exclusive && value <= rule.min) {
      rangeFail(path, rule.min === 0 ? `must be greater than zero, got ${value}${unit}` : `must be above ${rule.min}${unit}, got ${value}${unit}`);
    }
    if (!rule.exclusive && value < rule.min) {
      rangeFail(path, rule.min === 0 ? `must not be negative, got ${value}${unit}` : `must be at least ${rule.min}${unit}, got ${value}${unit}`);
    }
  }
  if (rule.max !== undefined && value > rule.max) rangeFail(path, `must be at most ${rule.max}${unit}, got ${value}${unit}`);
  return value;
}

export function readNumber(obj: Obj, key: string, path: string, rule: NumberRule = {}): number {
  const p = fieldPath(path, key);
  if (obj[key] === undefined) typeFail(p, 'is required');
  return asNumber(obj[key], p, rule);
}

export function readOptionalNumber(obj: Obj, key: string, path: string, rule: NumberRule = {}): number | undefined {
  return obj[key] === undefined ? undefined : asNumber(obj[key], fieldPath(path, key), rule);
}

export function readString(obj: Obj, key: string, path: string): string {
  const p = fieldPath(path, key);
  const value = obj[key];
  if (value === undefined) typeFail(p, 'is required');
  if (typeof value !== 'string') typeFail(p, `must be text, got ${describe(value)}`);
  return value;
}

export function readOptionalString(obj: Obj, key: string, path: string): string | undefined {
  return obj[key] === undefined ? undefined : readString(obj, key, path);
}

export function readOptionalBoolean(obj: Obj, key: string, path: string): boolean | undefined {
  const value = obj[key];
  if (value === undefined) return undefined;
  if (typeof value !== 'boolean') typeFail(fieldPath(path, key), `must be true or false, got ${describe(value)}`);
  return value;
}

const ID_PATTERN = /^[A-Za-z0-9_-]{1,64}$/;

/** Ids become column names (`Q1.junction_c`), so they keep to letters, digits, `_` and `-`. */
export function asId(value: unknown, path: string): string {
  if (value === undefined) typeFail(path, 'is required');
  if (typeof value !== 'string') typeFail(path, `must be text, got ${describe(value)}`);
  if (!ID_PATTERN.test(value)) rangeFail(path, `must be 1–64 letters, digits, "_" or "-", got ${JSON.stringify(value)}`);
  return value;
}

export function readId(obj: Obj, key: string, path: string): string {
  return asId(obj[key], fieldPath(path, key));
}

const MAX_DEPTH = 64;

/** Objects known to hold only finite numbers (parsed before, not changed since): not walked. */
export type KnownFinite = (value: object) => boolean;
const noneKnown: KnownFinite = () => false;

/** True when a NaN or ±Infinity sits anywhere in the value; cheap, builds no paths. */
function hasNonFinite(value: unknown, depth: number, known: KnownFinite): boolean {
  if (typeof value === 'number') return !Number.isFinite(value);
  if (typeof value !== 'object' || value === null) return false;
  if (known(value)) return false;
  if (depth > MAX_DEPTH) return true;
  for (const item of Array.isArray(value) ? value : Object.values(value)) if (hasNonFinite(item, depth + 1, known)) return true;
  return false;
}

/**
 * Path of the first NaN or ±Infinity in the value (JavaScript callers can pass them; JSON
 * cannot), in document order; objects `known` to be finite are passed over.
 */
export function findNonFinite(value: unknown, path = '', depth = 0, known: KnownFinite = noneKnown): string | undefined {
  if (depth === 0 && !hasNonFinite(value, 0, known)) return undefined;
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : path;
  if (typeof value === 'object' && value !== null && known(value)) return undefined;
  if (depth > MAX_DEPTH) typeFail(path, `is nested more than ${MAX_DEPTH} levels deep`);
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const hit = findNonFinite(value[i], fieldPath(path, i), depth + 1, known);
      if (hit !== undefined) return hit;
    }
    return undefined;
  }
  if (typeof value === 'object' && value !== null) {
    for (const [key, item] of Object.entries(value)) {
      const hit = findNonFinite(item, fieldPath(path, key), depth + 1, known);
      if (hit !== undefined) return hit;
    }
  }
  return undefined;
}
