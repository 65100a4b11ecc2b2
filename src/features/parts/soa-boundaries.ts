import type { SoaChartBoundary } from '@/charts/soa-chart-model';
import { soaBoundary, type PulseWidth } from '@/core/soa';
import { parseSoa } from '@/core/study';

import { formatTime } from './part-format';
import type { SoaJson } from './types';

/** Datasheet SOA curves are drawn at a 25 °C case (PHYSICS.md §4). */
export const REFERENCE_CASE_C = 25;
/** A hot case to show the derating: 100 °C is a case a loaded sink reaches (common practice). */
export const DERATED_CASE_C = 100;

/** Pulse lines a parametric model with Zθjc is drawn for: 1 ms and 10 ms, as datasheets often show (common practice). */
const PARAMETER_PULSES_S = [0.001, 0.01];

export type PartSoaChart = { boundaries: SoaChartBoundary[]; error: null } | { boundaries: []; error: string };

/**
 * The boundaries of a part's own SOA chart: DC at a 25 °C case, DC derated at 100 °C, then
 * each pulse width the model holds (a points model's curves, or 1 ms and 10 ms from Zθjc) at
 * 25 °C. A model the SOA core refuses answers its reason instead.
 */
export function partSoaChart(soa: SoaJson): PartSoaChart {
  try {
    const model = parseSoa(soa, 'soa');
    const pulses: number[] =
      model.kind === 'points'
        ? model.curves.map((c) => c.pulseS).filter((p): p is number => p !== 'dc').sort((a, b) => a - b)
        : model.zthJc
          ? PARAMETER_PULSES_S
          : [];
    const name = (p: PulseWidth) => (p === 'dc' ? 'DC' : `${formatTime(p)} pulse`);
    const at = (caseC: number, pulseS: PulseWidth): SoaChartBoundary => ({
      label: `${name(pulseS)}, ${caseC} °C case`,
      segments: soaBoundary(model, { caseC, pulseS }).segments,
    });
    // A datasheet model without a DC curve shows its longest pulse derated instead.
    const hasDc = model.kind === 'parameters' || model.curves.some((c) => c.pulseS === 'dc');
    const longest: PulseWidth = hasDc ? 'dc' : pulses[pulses.length - 1];
    const shortFirst = hasDc ? pulses : pulses.slice(0, -1);
    return {
      boundaries: [at(REFERENCE_CASE_C, longest), at(DERATED_CASE_C, longest), ...shortFirst.map((p) => at(REFERENCE_CASE_C, p))],
      error: null,
    };
  } catch (e) {
    if (e instanceof RangeError || e instanceof TypeError) return { boundaries: [], error: e.message };
    throw e;
  }
}
