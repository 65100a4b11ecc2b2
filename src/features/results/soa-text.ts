import type { SoaChartBoundary, SoaChartPoint } from '@/charts/soa-chart';
import type { DeviceSoaResult, PulseWidth, SoaBoundary, SoaLimit, SoaPointResult } from '@/core/study';
import { formatDuration, formatNumber, formatQuantity } from '@/features/studies/quantity-format';

/** What bounds the allowed current, in words that follow "limited by". */
export const LIMIT_WORDS: Record<SoaLimit, string> = {
  current: 'the current rating',
  thermal: 'the thermal limit',
  'second-breakdown': 'second breakdown',
  voltage: 'the voltage rating',
};

/** "DC" or "a 10 ms pulse". */
export function pulseText(pulse: PulseWidth): string {
  if (pulse === 'dc') return 'DC';
  return pulse < 1 ? `a ${formatNumber(pulse * 1000)}\u00a0ms pulse` : `a ${formatDuration(pulse)} pulse`;
}

/** Ic as a share of the allowed current at the point, %: 100 / margin. */
export const shareOfAllowed = (p: Pick<SoaPointResult, 'margin'>) => 100 / p.margin;

/**
 * The worst point in one sentence: "Q1: worst point 15 V, 2.5 A at 38 s, 71 % of the allowed
 * current, limited by second breakdown at Tc = 86 °C".
 */
export function worstSentence(id: string, soa: DeviceSoaResult): string {
  const w = soa.worst;
  if (!w) return `${id}: no stretch carries current, so there is no point to check`;
  const share = Math.round(shareOfAllowed(w));
  const pulse = w.pulseS === 'dc' ? '' : ` (as ${pulseText(w.pulseS)})`;
  return (
    `${id}: worst point ${formatQuantity(w.vceV, 'V')}, ${formatQuantity(w.icA, 'A')} at ${formatDuration(w.timeS)}${pulse}, ` +
    `${share}\u00a0% of the allowed current, limited by ${LIMIT_WORDS[w.limit]} at Tc = ${formatQuantity(w.caseC, '°C')}`
  );
}

/** Pass or fail over every operating point. */
export function soaVerdictText(soa: DeviceSoaResult): string {
  const points = soa.distinctPoints === 1 ? '1 operating point' : `${soa.distinctPoints} operating points`;
  if (soa.passed) return `Passes: all ${points} lie inside the SOA derated for their case temperature.`;
  return `Fails: ${soa.failedPoints} of ${points} lie outside the SOA derated for their case temperature.`;
}

/** A boundary's name on the chart: its pulse width and case temperature. */
export function boundaryLabel(b: SoaBoundary): string {
  const pulse = b.condition.pulseS === 'dc' ? 'DC' : pulseText(b.condition.pulseS).replace(/^a /, '');
  return `${pulse} at Tc = ${formatQuantity(b.condition.caseC, '°C')}`;
}

/** The two boundaries to draw: derated at the worst point's case temperature first (it applies), then the datasheet's 25 °C. */
export function chartBoundaries(soa: DeviceSoaResult): SoaChartBoundary[] {
  if (!soa.boundaries) return [];
  const { atWorstCase, atReference } = soa.boundaries;
  return [
    { label: `${boundaryLabel(atWorstCase)} (derated)`, segments: atWorstCase.segments },
    { label: `${boundaryLabel(atReference)} (datasheet)`, segments: atReference.segments },
  ];
}

const isWorst = (p: SoaPointResult, w: SoaPointResult | null) => w !== null && p.timeS === w.timeS && p.vceV === w.vceV && p.icA === w.icA && p.durationS === w.durationS;

/** Every listed operating point, the worst one flagged. */
export function chartPoints(soa: DeviceSoaResult): SoaChartPoint[] {
  return soa.points.map((p) => ({ vceV: p.vceV, icA: p.icA, worst: isWorst(p, soa.worst), occurrences: p.occurrences }));
}

/** Warnings that say the same thing, gathered over the devices that raise them. */
export type GroupedWarning = { code: string; message: string; devices: { id: string; stretches: number; firstTimeS: number }[] };

/** Identical warnings (same code and message) across devices become one, naming every device. */
export function groupSoaWarnings(soa: Record<string, DeviceSoaResult>): GroupedWarning[] {
  const groups = new Map<string, GroupedWarning>();
  for (const [id, result] of Object.entries(soa)) {
    for (const w of result.warnings) {
      const key = `${w.code}\u0000${w.message}`;
      const group = groups.get(key) ?? { code: w.code, message: w.message, devices: [] };
      group.devices.push({ id, stretches: w.stretches, firstTimeS: w.firstTimeS });
      groups.set(key, group);
    }
  }
  return [...groups.values()];
}

/** "Q1 (3 stretches from 0 s) and Q2 (1 stretch from 12 s)". */
export function warningDevicesText(g: GroupedWarning): string {
  const parts = g.devices.map((d) => `${d.id} (${d.stretches} ${d.stretches === 1 ? 'stretch' : 'stretches'} from ${formatDuration(d.firstTimeS)})`);
  return parts.length <= 1 ? (parts[0] ?? '') : `${parts.slice(0, -1).join(', ')} and ${parts[parts.length - 1]}`;
}

/**
 * Solver warnings the SOA and rail-plan panels already show in full: the evaluation copies each
 * SOA warning as "<device>: <message> (…)" and each rail-plan warning as "railPlan: …".
 */
export function shownElsewhere(warning: string, soa: Record<string, DeviceSoaResult>, hasRailPlan: boolean): boolean {
  if (hasRailPlan && warning.startsWith('railPlan: ')) return true;
  return Object.entries(soa).some(([id, r]) => r.warnings.some((w) => warning.startsWith(`${id}: ${w.message}`)));
}

/** One line for the verdict: whether the SOA checks pass and which warnings to read. */
export function soaSummary(soa: Record<string, DeviceSoaResult>): string | null {
  const ids = Object.keys(soa);
  if (ids.length === 0) return null;
  const failing = ids.filter((id) => !soa[id].passed);
  const warned = ids.filter((id) => soa[id].warnings.length > 0);
  const list = (xs: string[]) => (xs.length <= 1 ? xs.join('') : `${xs.slice(0, -1).join(', ')} and ${xs[xs.length - 1]}`);
  const head = failing.length === 0 ? `SOA check passes for ${list(ids)}` : `SOA check fails for ${list(failing)}`;
  return `${head}${warned.length ? `, with a warning for ${list(warned)} (see Safe operating area)` : ''}.`;
}
