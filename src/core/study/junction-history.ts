import { createArrheniusAverage, createTurningPoints, type ArrheniusAverage, type TurningPoints } from '../reliability';
import type { StudyArrhenius } from './reliability-types';
import { MAX_HISTORY_TURNING_POINTS } from './constants';

/**
 * The junction temperature history of each device over the counted window [0, endS], from
 * values the solver already has: every stretch's exact start (and the run's end) plus the
 * interior peaks it found. Kept as turning points only (for rainflow counting) and as a running
 * time-weighted Arrhenius factor; memory grows with the turning points, not the stretches.
 */
export type JunctionHistory = {
  endS: number;
  add(device: number, timeS: number, valueC: number): void;
  turningPoints(device: number): Float64Array;
  arrhenius(device: number): ArrheniusAverage | null;
  /** True when a device's history held more than MAX_HISTORY_TURNING_POINTS (the rest was not counted). */
  truncated(device: number): boolean;
};

/** Times within this fraction of the window's end still belong to it (round-off of summed durations). */
const END_SLACK = 1e-9;

export function createJunctionHistory(deviceCount: number, endS: number, arrhenius?: StudyArrhenius): JunctionHistory {
  const points: TurningPoints[] = Array.from({ length: deviceCount }, () => createTurningPoints());
  const averages = Array.from({ length: deviceCount }, () => (arrhenius ? createArrheniusAverage(arrhenius.referenceC, arrhenius.activationEnergyEV) : null));
  const full = new Array<boolean>(deviceCount).fill(false);
  const lastT = new Float64Array(deviceCount).fill(-Infinity);
  const limit = endS * (1 + END_SLACK);
  return {
    endS,
    add(d, timeS, valueC) {
      // Points of one time can come twice (a chunk's end is the next one's start); later times only.
      if (timeS > limit || timeS < lastT[d]) return;
      lastT[d] = timeS;
      averages[d]?.add(timeS, valueC);
      if (full[d]) return;
      if (points[d].length >= MAX_HISTORY_TURNING_POINTS) full[d] = true;
      else points[d].push(valueC);
    },
    turningPoints: (d) => points[d].values(),
    arrhenius: (d) => averages[d],
    truncated: (d) => full[d],
  };
}
