/** A chart series: times (s) and values (°C) of one node. */
export type Series = { timeS: number[]; valueC: number[] };

/**
 * Min/max decimation over equal time buckets: per node and bucket it keeps the lowest and
 * the highest sample (so every peak survives), plus the first and last sample, in time order.
 * Memory is fixed by the bucket count, whatever the number of samples.
 */
export type SeriesRecorder = {
  add(node: number, t: number, value: number): void;
  /** Highest value kept so far in the bucket holding time t (−Infinity when empty). */
  maxAt(node: number, t: number): number;
  build(): Record<string, Series>;
};

/** Buckets that keep a series within maxPoints (two per bucket, plus first and last). */
export const bucketsForPoints = (maxPoints: number): number => Math.max(1, Math.floor((maxPoints - 2) / 2));

export function createSeriesRecorder(keys: readonly string[], bucketS: number, bucketCount: number): SeriesRecorder {
  const size = keys.length * bucketCount;
  const minT = new Float64Array(size);
  const minV = new Float64Array(size).fill(Infinity);
  const maxT = new Float64Array(size);
  const maxV = new Float64Array(size).fill(-Infinity);
  const first = keys.map(() => ({ t: NaN, v: NaN }));
  const last = keys.map(() => ({ t: NaN, v: NaN }));

  const bucketOf = (t: number) => Math.min(bucketCount - 1, Math.max(0, Math.floor(t / bucketS)));

  function add(node: number, t: number, value: number): void {
    if (Number.isNaN(first[node].t)) {
      first[node].t = t;
      first[node].v = value;
    }
    if (!(t < last[node].t)) {
      last[node].t = t;
      last[node].v = value;
    }
    const k = node * bucketCount + bucketOf(t);
    if (value < minV[k]) {
      minV[k] = value;
      minT[k] = t;
    }
    if (value > maxV[k]) {
      maxV[k] = value;
      maxT[k] = t;
    }
  }

  function build(): Record<string, Series> {
    const out: Record<string, Series> = {};
    keys.forEach((key, node) => {
      const timeS: number[] = [];
      const valueC: number[] = [];
      const push = (t: number, v: number) => {
        const n = timeS.length;
        if (n > 0 && timeS[n - 1] === t && valueC[n - 1] === v) return;
        timeS.push(t);
        valueC.push(v);
      };
      if (!Number.isNaN(first[node].t)) push(first[node].t, first[node].v);
      for (let b = 0; b < bucketCount; b++) {
        const k = node * bucketCount + b;
        if (maxV[k] === -Infinity) continue;
        const lowFirst = minT[k] <= maxT[k];
        const pair: [number, number][] = lowFirst ? [[minT[k], minV[k]], [maxT[k], maxV[k]]] : [[maxT[k], maxV[k]], [minT[k], minV[k]]];
        for (const [t, v] of pair) push(t, v);
      }
      if (!Number.isNaN(last[node].t)) push(last[node].t, last[node].v);
      out[key] = { timeS, valueC };
    });
    return out;
  }

  return { add, maxAt: (node, t) => maxV[node * bucketCount + bucketOf(t)], build };
}
