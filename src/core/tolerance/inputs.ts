import type { StudyDocument } from '../study';
import { fedDevices } from '../study/segment-power';
import { DEFAULT_DISTRIBUTIONS, INPUT_LABELS } from './constants';
import type { ActiveInput, InputKey, SkippedInput, ToleranceSpec } from './types';

/** Pass devices in parallel that the share error moves current between (electrical segments' fed group). */
export function shareGroup(doc: StudyDocument): number[] {
  const group = new Set<number>();
  for (const segment of doc.profile.segments) {
    if (segment.railDrive) {
      const ids = segment.railDrive.devices;
      (ids ? ids.map((id) => doc.devices.findIndex((d) => d.id === id)) : fedDevices(doc, { ...segment, electrical: undefined })).forEach((i) => group.add(i));
    } else if (segment.electrical) fedDevices(doc, segment).forEach((i) => group.add(i));
  }
  return [...group].sort((a, b) => a - b);
}

const pct = (spec: ToleranceSpec, key: InputKey): number =>
  ({ rthJc: spec.rthJcPct, rthSa: spec.rthSaPct, interface: spec.interfacePct, line: spec.linePct, load: spec.loadPct, share: spec.sharePct, ambient: 0 })[key];

/** Why the study gives an input nothing to act on, or null when it applies. */
function notApplicable(doc: StudyDocument, key: InputKey): string | null {
  const segments = doc.profile.segments;
  switch (key) {
    case 'line':
      return segments.some((s) => s.electrical) || doc.railPlan ? null : 'the profile has no electrical segment and the study no rail plan';
    case 'load':
      return segments.some((s) => s.electrical || s.railDrive || Object.keys(s.powerW).length > 0) ? null : 'the profile carries no load';
    case 'share': {
      const parts = shareGroup(doc).reduce((n, i) => n + doc.devices[i].count, 0);
      return parts >= 2 ? null : 'no electrical segment feeds two or more parts in parallel';
    }
    default:
      return null;
  }
}

/** The inputs a spec spreads on a study, and those it spreads that the study cannot use. */
export function activeInputs(doc: StudyDocument, spec: ToleranceSpec): { inputs: ActiveInput[]; skipped: SkippedInput[] } {
  const inputs: ActiveInput[] = [];
  const skipped: SkippedInput[] = [];
  const group = shareGroup(doc);
  for (const key of ['rthJc', 'rthSa', 'interface', 'ambient', 'line', 'load', 'share'] as InputKey[]) {
    // The share error moves current to (or, negative, away from) the first part of the group.
    const label = key === 'share' && group.length > 0 ? `${INPUT_LABELS.share} of ${doc.devices[group[0]].id}` : INPUT_LABELS[key];
    const [low, high, unit] = key === 'ambient' ? [spec.ambientLowK, spec.ambientHighK, 'K' as const] : [-pct(spec, key) / 100, pct(spec, key) / 100, '%' as const];
    if (low === high) continue;
    const reason = notApplicable(doc, key);
    if (reason) {
      skipped.push({ key, label, reason });
      continue;
    }
    inputs.push({ key, label, low, high, unit, distribution: spec.distributions?.[key] ?? DEFAULT_DISTRIBUTIONS[key] });
  }
  return { inputs, skipped };
}

/** The deviation an input takes at the middle of its range (the nominal run). */
export const centre = (input: ActiveInput): number => (input.low + input.high) / 2;

/** "Rθsa +15 %", "Ambient +10 K". */
export function describeDeviation(input: ActiveInput, value: number): string {
  const sign = value > 0 ? '+' : value < 0 ? '−' : '±';
  const magnitude = input.unit === '%' ? `${+(Math.abs(value) * 100).toPrecision(3)} %` : `${+Math.abs(value).toPrecision(3)} K`;
  return `${input.label} ${sign}${magnitude}`;
}
