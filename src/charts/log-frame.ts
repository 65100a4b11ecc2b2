import type { ScaleLogarithmic } from 'd3-scale';

import { logDomain, logScale } from './log-axis';

/** Space around a log-log plot for tick labels and axis titles, px. */
export const LOG_PLOT_MARGIN = { top: 26, right: 16, bottom: 40, left: 48 } as const;

export type LogFrame = {
  width: number;
  height: number;
  left: number;
  top: number;
  right: number;
  bottom: number;
  x: ScaleLogarithmic<number, number>;
  y: ScaleLogarithmic<number, number>;
};

/** Positive finite values only: a log axis has no place for zero. */
const positive = (values: readonly number[]) => values.filter((v) => Number.isFinite(v) && v > 0);

/**
 * Log scales for a plot of the given size over the values' extents (widened to round ends),
 * or null when either axis has no positive value to show.
 */
export function logFrame(width: number, height: number, xs: readonly number[], ys: readonly number[]): LogFrame | null {
  const px = positive(xs);
  const py = positive(ys);
  if (px.length === 0 || py.length === 0) return null;
  const left = LOG_PLOT_MARGIN.left;
  const top = LOG_PLOT_MARGIN.top;
  const right = Math.max(left + 1, width - LOG_PLOT_MARGIN.right);
  const bottom = Math.max(top + 1, height - LOG_PLOT_MARGIN.bottom);
  return {
    width,
    height,
    left,
    top,
    right,
    bottom,
    x: logScale(logDomain(Math.min(...px), Math.max(...px)), [left, right]),
    y: logScale(logDomain(Math.min(...py), Math.max(...py)), [bottom, top]),
  };
}
