/** Bars and limit lines of the peak-Tj histogram, in data units (°C and run counts). */
export type HistogramModel = {
  bars: { x0: number; x1: number; count: number }[];
  /** Temperature range shown: the bins and both limit lines, padded a little. */
  domain: [number, number];
  maxCount: number;
};

/** The bins of a sweep's histogram, widened so the target and Tj,max lines stay on the chart. */
export function histogramModel(edgesC: readonly number[], counts: readonly number[], targetC: number, tjMaxC: number): HistogramModel {
  const bars = counts.map((count, i) => ({ x0: edgesC[i], x1: edgesC[i + 1], count }));
  const lo = Math.min(edgesC[0], targetC, tjMaxC);
  const hi = Math.max(edgesC[edgesC.length - 1], targetC, tjMaxC);
  const pad = Math.max(0.5, (hi - lo) * 0.04);
  return { bars, domain: [lo - pad, hi + pad], maxCount: Math.max(1, ...counts) };
}
