import { scaleLinear, type ScaleLinear } from 'd3-scale';

import type { TimeDomain } from './chart-zoom';

/** Space around the plot for the axes' labels, px. */
export const PLOT_MARGIN = { top: 22, right: 14, bottom: 38, left: 46 } as const;

export type PlotFrame = {
  width: number;
  height: number;
  /** The plot area inside the margins. */
  left: number;
  top: number;
  right: number;
  bottom: number;
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
};

/** Scales from time (s) and temperature (°C) to pixels for a chart of the given size. */
export function plotFrame(width: number, height: number, time: TimeDomain, temperature: [number, number]): PlotFrame {
  const left = PLOT_MARGIN.left;
  const top = PLOT_MARGIN.top;
  const right = Math.max(left + 1, width - PLOT_MARGIN.right);
  const bottom = Math.max(top + 1, height - PLOT_MARGIN.bottom);
  return {
    width,
    height,
    left,
    top,
    right,
    bottom,
    x: scaleLinear().domain(time).range([left, right]),
    y: scaleLinear().domain(temperature).range([bottom, top]),
  };
}

/** About one tick per 80 px across and per 40 px down, never fewer than two. */
export function tickCounts(frame: Pick<PlotFrame, 'left' | 'right' | 'top' | 'bottom'>): { x: number; y: number } {
  return {
    x: Math.max(2, Math.round((frame.right - frame.left) / 80)),
    y: Math.max(2, Math.round((frame.bottom - frame.top) / 40)),
  };
}
