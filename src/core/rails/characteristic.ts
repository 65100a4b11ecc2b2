import type { Characteristic } from './types';

/**
 * Output voltage against current of a source network, piecewise linear: points (i, v) with i
 * ascending, extended with leftSlope / rightSlope (V/A, ≤ 0). Sources are Thevenin
 * (Voc, Rs), diodes a constant drop that blocks reverse current, so every combination stays
 * piecewise linear and series / parallel can be composed exactly.
 */

export const thevenin = (emfV: number, rOhm: number): Characteristic => ({
  i: [0],
  v: [emfV],
  leftSlope: -rOhm,
  rightSlope: -rOhm,
  blocking: false,
});

/** Voltage at current i, V (i below the start of a blocking curve: its open-circuit voltage). */
export function voltageAt(c: Characteristic, i: number): number {
  const n = c.i.length;
  if (i <= c.i[0]) return c.blocking ? c.v[0] : c.v[0] + c.leftSlope * (i - c.i[0]);
  if (i >= c.i[n - 1]) return c.v[n - 1] + c.rightSlope * (i - c.i[n - 1]);
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (c.i[mid] <= i) lo = mid;
    else hi = mid;
  }
  return c.v[lo] + ((i - c.i[lo]) / (c.i[hi] - c.i[lo])) * (c.v[hi] - c.v[lo]);
}

/** Current at terminal voltage v, A; needs a strictly decreasing curve (see isStrictlyDecreasing). */
export function currentAt(c: Characteristic, v: number): number {
  const n = c.i.length;
  if (v >= c.v[0]) return c.blocking ? 0 : c.i[0] + (v - c.v[0]) / c.leftSlope;
  if (v <= c.v[n - 1]) return c.i[n - 1] + (v - c.v[n - 1]) / c.rightSlope;
  let lo = 0;
  let hi = n - 1;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (c.v[mid] >= v) lo = mid;
    else hi = mid;
  }
  return c.i[lo] + ((v - c.v[lo]) / (c.v[hi] - c.v[lo])) * (c.i[hi] - c.i[lo]);
}

export function isStrictlyDecreasing(c: Characteristic): boolean {
  if (!(c.rightSlope < 0) || (!c.blocking && !(c.leftSlope < 0))) return false;
  for (let k = 1; k < c.i.length; k++) if (!(c.v[k] < c.v[k - 1])) return false;
  return true;
}

/** Series: voltages add at the common current; the result blocks if any part does. */
export function seriesOf(parts: readonly Characteristic[]): Characteristic {
  const blocking = parts.some((p) => p.blocking);
  const points = new Set<number>(blocking ? [0] : []);
  for (const p of parts) for (const i of p.i) if (!blocking || i > 0) points.add(i);
  const i = [...points].sort((a, b) => a - b);
  return {
    i,
    v: i.map((x) => parts.reduce((sum, p) => sum + voltageAt(p, x), 0)),
    leftSlope: parts.reduce((s, p) => s + p.leftSlope, 0),
    rightSlope: parts.reduce((s, p) => s + p.rightSlope, 0),
    blocking,
  };
}

/**
 * Parallel: branch currents add at the common voltage. Each branch must be strictly
 * decreasing (a resistance in it), or the share between branches is undefined.
 */
export function parallelOf(branches: readonly Characteristic[]): Characteristic {
  const blocking = branches.every((b) => b.blocking);
  const top = blocking ? Math.max(...branches.map((b) => b.v[0])) : Infinity;
  const levels = new Set<number>(blocking ? [top] : []);
  for (const b of branches) for (const v of b.v) if (v <= top) levels.add(v);
  const v = [...levels].sort((a, b) => b - a);
  const i = v.map((x) => (x === top ? 0 : branches.reduce((sum, b) => sum + currentAt(b, x), 0)));
  const conductance = (slopes: number[]) => slopes.reduce((g, s) => g - 1 / s, 0);
  const open = branches.filter((b) => !b.blocking);
  return {
    i,
    v,
    leftSlope: open.length > 0 ? -1 / conductance(open.map((b) => b.leftSlope)) : branches[0].leftSlope,
    rightSlope: -1 / conductance(branches.map((b) => b.rightSlope)),
    blocking,
  };
}

/** A diode drop (which blocks reverse current) and a ballast resistor in series with a curve. */
export function withPath(c: Characteristic, diodeV: number | undefined, ballastOhm: number | undefined): Characteristic {
  const rb = ballastOhm ?? 0;
  const vd = diodeV ?? 0;
  const blocking = c.blocking || diodeV !== undefined;
  let i = c.i;
  let v = c.v;
  if (blocking && !c.blocking) {
    const kept = c.i.filter((x) => x > 0);
    i = [0, ...kept];
    v = i.map((x) => voltageAt(c, x));
  }
  return {
    i: [...i],
    v: v.map((x, k) => x - vd - rb * i[k]),
    leftSlope: c.leftSlope - rb,
    rightSlope: c.rightSlope - rb,
    blocking,
  };
}
