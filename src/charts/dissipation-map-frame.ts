import { scaleLinear, type ScaleLinear } from 'd3-scale';

import { cellEdges } from './dissipation-map-model';

/** Room around the map for tap names (top) and the axes' labels, px. */
export const MAP_MARGIN = { top: 24, right: 12, bottom: 40, left: 40 } as const;

export type MapFrame = {
  width: number;
  height: number;
  left: number;
  top: number;
  right: number;
  bottom: number;
  /** Vout (V) across, Iout (A) up, over the cells' outer edges. */
  x: ScaleLinear<number, number>;
  y: ScaleLinear<number, number>;
};

/** Scales from output voltage and current to pixels, the grid filling the plot edge to edge. */
export function mapFrame(width: number, height: number, voutV: readonly number[], ioutA: readonly number[]): MapFrame {
  const xe = cellEdges(voutV);
  const ye = cellEdges(ioutA);
  const left = MAP_MARGIN.left;
  const top = MAP_MARGIN.top;
  const right = Math.max(left + 1, width - MAP_MARGIN.right);
  const bottom = Math.max(top + 1, height - MAP_MARGIN.bottom);
  return {
    width,
    height,
    left,
    top,
    right,
    bottom,
    x: scaleLinear().domain([xe[0], xe[xe.length - 1]]).range([left, right]),
    y: scaleLinear().domain([ye[0], ye[ye.length - 1]]).range([bottom, top]),
  };
}

/** Axis ticks inside the grid's own range (not the half cells beyond it): about one per 70 px across, 36 px up. */
export function mapTicks(frame: MapFrame, voutV: readonly number[], ioutA: readonly number[]): { x: number[]; y: number[] } {
  const within = (ticks: number[], values: readonly number[]) => ticks.filter((t) => t >= values[0] - 1e-9 && t <= values[values.length - 1] + 1e-9);
  const nx = Math.max(2, Math.round((frame.right - frame.left) / 70));
  const ny = Math.max(2, Math.round((frame.bottom - frame.top) / 36));
  return {
    x: within(scaleLinear().domain([voutV[0], voutV[voutV.length - 1]]).ticks(nx), voutV),
    y: within(scaleLinear().domain([ioutA[0], ioutA[ioutA.length - 1]]).ticks(ny), ioutA),
  };
}
