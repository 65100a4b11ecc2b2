import type { SoaChartBoundary } from './soa-chart-model';
import { soaBoundary, type PulseWidth } from '@/core/soa';
import { parseSoa } from '@/core/study';

import { formatTime } from '@/features/parts/part-format';
import type { SoaJson } from '@/features/parts/types';

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
    // A datasheet model without a DC curve shows its longest pulse derated instead.
    const hasDc = model.kind === 'parameters' || model.curves.some((c) => c.pulseS === 'dc');
    const longest: PulseWidth = hasDc ? 'dc' : pulses[pulses.length - 1];
    const shorter = hasDc ? pulses : pulses.slice(0, -1);
    const conditions: { caseC: number; pulseS: PulseWidth }[] = [
      { caseC: REFERENCE_CASE_C, pulseS: longest },
      { caseC: DERATED_CASE_C, pulseS: longest },
      ...shorter.map((pulseS) => ({ caseC: REFERENCE_CASE_C, pulseS })),
    ];
    // Pulses that end on the same boundary (limited by current and second breakdown alone) share one line and one label.
    const drawn: { caseC: number; pulses: PulseWidth[]; segments: SoaChartBoundary['segments'] }[] = [];
    for (const c of conditions) {
      const segments = soaBoundary(model, c).segments;
      const same = drawn.find((d) => d.caseC === c.caseC && sameSegments(d.segments, segments));
      if (same) same.pulses.push(c.pulseS);
      else drawn.push({ caseC: c.caseC, pulses: [c.pulseS], segments });
    }
    return { boundaries: drawn.map((d) => ({ label: `${pulseNames(d.pulses)}, ${d.caseC} °C case`, segments: d.segments })), error: null };
  } catch (e) {
    if (e instanceof RangeError || e instanceof TypeError) return { boundaries: [], error: e.message };
    throw e;
  }
}

/** "DC", "1 ms pulse", "1 ms and 10 ms pulses". */
function pulseNames(pulses: readonly PulseWidth[]): string {
  const dc = pulses.includes('dc');
  const widths = pulses.filter((p): p is number => p !== 'dc').map(formatTime);
  const timed = widths.length === 0 ? '' : widths.length === 1 ? `${widths[0]} pulse` : `${widths.slice(0, -1).join(', ')} and ${widths[widths.length - 1]} pulses`;
  return [dc ? 'DC' : '', timed].filter(Boolean).join(' and ');
}

function sameSegments(a: SoaChartBoundary['segments'], b: SoaChartBoundary['segments']): boolean {
  const close = (x: number, y: number) => Math.abs(x - y) <= 1e-9 * Math.max(Math.abs(x), Math.abs(y));
  return (
    a.length === b.length &&
    a.every((s, i) => s.limit === b[i].limit && s.points.length === b[i].points.length && s.points.every((p, k) => close(p.vceV, b[i].points[k].vceV) && close(p.icA, b[i].points[k].icA)))
  );
}
