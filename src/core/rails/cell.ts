import { passDissipationW } from '../electrical';
import { voltageAt } from './characteristic';
import { dropoutAt, limitAt } from './element';
import type { CompiledTap, PassElement, TapThresholds } from './types';

/** Cell marks of the dissipation map, by severity; codes index CELL_STATUS. */
export const CELL_STATUS = ['ok', 'dropout', 'current-limit', 'over-capacity', 'not-served'] as const;
export type CellStatus = (typeof CELL_STATUS)[number];
export const CELL_OK = 0;
export const CELL_DROPOUT = 1;
export const CELL_CURRENT_LIMIT = 2;
export const CELL_OVER_CAPACITY = 3;
export const CELL_NOT_SERVED = 4;

export type Cell = { status: number; powerW: number; vinV: number };

/**
 * One (Vout, Iout) through one tap. Over the tap's capability or the element's current limit
 * the load is not served (NaN power). Without headroom for the dropout the output sags to
 * Vin − Vdropout and the power is that of the sagged output (marked dropout).
 */
export function evaluateCell(tap: CompiledTap, element: PassElement, voutV: number, ioutA: number): Cell {
  const vin = voltageAt(tap.characteristic, ioutA);
  if (ioutA > tap.capabilityA) return { status: CELL_OVER_CAPACITY, powerW: Number.NaN, vinV: vin };
  const vdrop = dropoutAt(element, ioutA);
  const inDropout = vin - voutV < vdrop;
  const vout = inDropout ? vin - vdrop : voutV;
  if (ioutA > limitAt(element, vin - vout)) return { status: CELL_CURRENT_LIMIT, powerW: Number.NaN, vinV: vin };
  const powerW = passDissipationW(vin, Math.max(0, vout), ioutA, element.iqA);
  return { status: inDropout ? CELL_DROPOUT : CELL_OK, powerW, vinV: vin };
}

/**
 * Output voltages tap k may serve, with hysteresis (PHYSICS.md §2): from θ(k−1) − h/2 (coming
 * down) to θk + h/2 (going up); the first tap has no floor, the last no ceiling.
 */
export function serviceRange(t: TapThresholds, k: number): { fromV: number; toV: number } {
  const half = t.hysteresisV / 2;
  return {
    fromV: k === 0 ? -Infinity : t.thresholdsV[k - 1] - half,
    toV: k === t.thresholdsV.length ? Infinity : t.thresholdsV[k] + half,
  };
}
