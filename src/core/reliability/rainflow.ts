import { turningPoints } from './turning-points';

/**
 * Counted cycles: range (max − min of the cycle), mean ((max + min)/2) and count (1 for a full
 * cycle, 0.5 for a half), in the order they were counted. Same units as the history.
 */
export type RainflowCycles = {
  length: number;
  range: Float64Array;
  mean: Float64Array;
  count: Float64Array;
};

function createCycles(capacity: number): RainflowCycles & { add(a: number, b: number, count: number): void } {
  const size = Math.max(1, capacity);
  const cycles = {
    length: 0,
    range: new Float64Array(size),
    mean: new Float64Array(size),
    count: new Float64Array(size),
    add(a: number, b: number, count: number) {
      const k = cycles.length++;
      cycles.range[k] = Math.abs(a - b);
      cycles.mean[k] = 0.5 * (a + b);
      cycles.count[k] = count;
    },
  };
  return cycles;
}

/** Trims the arrays to the cycles counted. */
function trimmed(c: RainflowCycles): RainflowCycles {
  return { length: c.length, range: c.range.slice(0, c.length), mean: c.mean.slice(0, c.length), count: c.count.slice(0, c.length) };
}

/**
 * Rainflow counting, ASTM E1049-85 (reapproved 2017) §5.4.4, on a history reduced to its
 * turning points first. X is the most recent range, Y the one before it: while X ≥ Y, Y is
 * a full cycle (its two points leave the stack), or a half cycle when it holds the starting
 * point (only the start leaves); what is left at the end counts as half cycles. Every point
 * is pushed once and popped at most once: linear time, and the stack never holds more
 * points than the history.
 */
export function rainflow(history: ArrayLike<number>): RainflowCycles {
  const points = turningPoints(history);
  const n = points.length;
  // Each turning point ends at most one counted range, plus the residue.
  const cycles = createCycles(n);
  const stack = new Float64Array(n);
  let top = 0;
  for (let i = 0; i < n; i++) {
    stack[top++] = points[i];
    while (top >= 3) {
      const x = Math.abs(stack[top - 1] - stack[top - 2]);
      const y = Math.abs(stack[top - 2] - stack[top - 3]);
      if (x < y) break;
      if (top === 3) {
        // Y holds the starting point S: half a cycle, and S moves to Y's second point.
        cycles.add(stack[0], stack[1], 0.5);
        stack[0] = stack[1];
        stack[1] = stack[2];
        top = 2;
      } else {
        cycles.add(stack[top - 3], stack[top - 2], 1);
        stack[top - 3] = stack[top - 1];
        top -= 2;
      }
    }
  }
  for (let k = 0; k + 1 < top; k++) cycles.add(stack[k], stack[k + 1], 0.5);
  return trimmed(cycles);
}

/**
 * Rainflow counting of one period of a history that repeats without end (periodic steady
 * state): the period is rotated to start at its highest turning point and closed by it, the
 * usual treatment of a repeated block (Downing & Socie, Int. J. Fatigue 1982), so every
 * range is a closed cycle; the half cycles the standard's residue leaves pair up into whole
 * ones of the same range and mean. A flat history has no cycles.
 */
export function rainflowPeriodic(period: ArrayLike<number>): RainflowCycles {
  const points = turningPoints(period);
  const n = points.length;
  if (n < 2) return trimmed(createCycles(0));
  let at = 0;
  for (let i = 1; i < n; i++) if (points[i] > points[at]) at = i;
  const rotated = new Float64Array(n + 1);
  for (let i = 0; i < n; i++) rotated[i] = points[(at + i) % n];
  rotated[n] = points[at];
  return pairHalfCycles(rainflow(rotated));
}

/**
 * Joins half cycles of identical range and mean into whole ones (a closed history leaves them
 * in pairs); full cycles pass through unchanged, in their order.
 */
export function pairHalfCycles(c: RainflowCycles): RainflowCycles {
  const index = new Map<string, number>();
  const out = createCycles(c.length);
  for (let k = 0; k < c.length; k++) {
    const half = c.count[k] < 1;
    const key = half ? `${c.range[k]}:${c.mean[k]}` : '';
    const at = half ? index.get(key) : undefined;
    if (at !== undefined && out.count[at] < 1) {
      out.count[at] += c.count[k];
      index.delete(key);
      continue;
    }
    const j = out.length++;
    out.range[j] = c.range[k];
    out.mean[j] = c.mean[k];
    out.count[j] = c.count[k];
    if (half) index.set(key, j);
  }
  return trimmed(out);
}
