import { CELL_DROPOUT, CELL_OVER_CAPACITY, CELL_CURRENT_LIMIT } from './cell';
import { checkChatter, type ChatterCheck, type Relay } from './chatter';
import { voltageAt } from './characteristic';
import { dissipationMap, type DissipationMap } from './dissipation-map';
import { requiredSinkRth, type SinkSizing } from './required-sink';
import type { OutputRange, PassElement, RailModel, TapCapability } from './types';
import { bestThresholds, tapWorstCases, type BestThreshold, type WorstCases } from './worst-case';

export type RailPlanOptions = {
  steps?: { vout?: number; iout?: number };
  /** One device on its sink (PHYSICS.md §5), or any function from worst power (W) to required Rθsa (K/W). */
  sink?: SinkSizing | ((powerW: number) => number);
  /** Relay and input capacitor, for the chatter check at the top current of the range. */
  relay?: Relay;
};

export type RailPlanReport = {
  taps: (TapCapability & { name: string; openCircuitV: number })[];
  map: DissipationMap;
  /** With the plan's thresholds. */
  worst: WorstCases;
  thresholds: BestThreshold[];
  /** With every threshold at its best value. */
  worstWithBest: WorstCases;
  /** Required Rθsa for the overall worst case, K/W, with the plan's and with the best thresholds. */
  requiredRsa?: { givenKPerW: number; bestKPerW: number };
  chatter?: ChatterCheck;
  warnings: string[];
};

/** Everything a study shows for a rail plan: map, worst cases, best thresholds, sink and chatter. */
export function railPlanReport(model: RailModel, element: PassElement, range: OutputRange, options: RailPlanOptions = {}): RailPlanReport {
  const map = dissipationMap(model, element, range, options.steps);
  const worst = tapWorstCases(model, element, range);
  const thresholds = bestThresholds(model, element, range);
  const best = { thresholdsV: thresholds.map((t) => t.bestV), hysteresisV: model.plan.hysteresisV };
  const worstWithBest = tapWorstCases(model, element, range, best);
  const warnings: string[] = [];
  for (const t of thresholds) {
    if (!t.safe) {
      warnings.push(
        `Threshold ${t.index + 1} (${t.givenV} V) lies above ${t.bestV.toFixed(2)} V: ` +
          `tap "${model.taps[t.index].name}" runs out of headroom at ${t.fullCurrentA.toPrecision(3)} A before the switch.`,
      );
    }
  }
  const marks = countMarks(map);
  if (marks.dropout > 0) warnings.push(`${marks.dropout} cells of the map are in dropout: the output sags there.`);
  if (marks.overCapacity > 0) warnings.push(`${marks.overCapacity} cells ask for more current than the tap can supply.`);
  if (marks.currentLimit > 0) warnings.push(`${marks.currentLimit} cells lie beyond the element's current limit.`);
  const report: RailPlanReport = {
    taps: model.taps.map((t) => ({
      name: t.name,
      openCircuitV: voltageAt(t.characteristic, 0),
      capabilityA: t.capabilityA,
      limitedBy: t.limitedBy,
      shareErrorA: t.shareErrorA,
    })),
    map,
    worst,
    thresholds,
    worstWithBest,
    warnings,
  };
  if (options.sink && worst.overall && worstWithBest.overall) {
    const sink = options.sink;
    const rsa = (p: number) => (typeof sink === 'function' ? sink(p) : requiredSinkRth(p, sink).rsaKPerW);
    report.requiredRsa = { givenKPerW: rsa(worst.overall.powerW), bestKPerW: rsa(worstWithBest.overall.powerW) };
  }
  if (options.relay) {
    report.chatter = checkChatter(model.plan, options.relay, range.ioutMaxA);
    if (report.chatter.message) warnings.push(report.chatter.message);
  }
  return report;
}

function countMarks(map: DissipationMap) {
  let dropout = 0;
  let overCapacity = 0;
  let currentLimit = 0;
  for (const s of map.overall.status) {
    if (s === CELL_DROPOUT) dropout++;
    else if (s === CELL_OVER_CAPACITY) overCapacity++;
    else if (s === CELL_CURRENT_LIMIT) currentLimit++;
  }
  return { dropout, overCapacity, currentLimit };
}
