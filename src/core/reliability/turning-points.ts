/**
 * Reduction of a history to its peaks and valleys (ASTM E1049-85 (2017) §3.1.13 and §5.4.1):
 * repeated values and the inner points of monotone runs go; the first and the last point
 * stay. Streaming: `push` is O(1) amortised, memory holds only the turning points.
 */
export type TurningPoints = {
  push(value: number): void;
  /** Number of points kept so far. */
  readonly length: number;
  /** The points kept so far (a copy). */
  values(): Float64Array;
};

export function createTurningPoints(initialCapacity = 64): TurningPoints {
  let out = new Float64Array(Math.max(2, initialCapacity));
  let n = 0;
  let direction = 0;

  function append(value: number): void {
    if (n === out.length) {
      const grown = new Float64Array(out.length * 2);
      grown.set(out);
      out = grown;
    }
    out[n++] = value;
  }

  return {
    push(value: number): void {
      if (!Number.isFinite(value)) throw new RangeError(`turning points: values must be finite, got ${value}`);
      if (n === 0) return append(value);
      const step = Math.sign(value - out[n - 1]);
      if (step === 0) return;
      if (n > 1 && step === direction) {
        out[n - 1] = value;
        return;
      }
      direction = step;
      append(value);
    },
    get length() {
      return n;
    },
    values: () => out.slice(0, n),
  };
}

/** The turning points of a whole history. */
export function turningPoints(history: ArrayLike<number>): Float64Array {
  const tp = createTurningPoints(Math.min(history.length, 1024));
  for (let i = 0; i < history.length; i++) tp.push(history[i]);
  return tp.values();
}
