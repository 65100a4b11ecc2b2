import { adjustableOutputV, adjustableTopOfRange } from '../rails';
import type { ProfileSegment, StudyDocument } from './types';
import { fedDevices, segmentPower } from './segment-power';

/** An adjustable regulator's set point from its divider and how far the profile's input lets it get. */
export type AdjustableResult = {
  /** Vref (1 + R2/R1) + Iadj·R2, V (PHYSICS.md §1). */
  dividerV: number;
  /**
   * At the highest input among the segments that ask for the divider's output: the output
   * reached, min(divider, Vin − Vdropout), and which of the two sets it.
   */
  top?: { vinV: number; currentA: number; reachableV: number; limitedBy: 'divider' | 'dropout' };
};

export function adjustableResult(doc: StudyDocument, d: number): AdjustableResult | undefined {
  const divider = doc.devices[d].electrical?.adjustable;
  if (!divider) return undefined;
  const dividerV = adjustableOutputV(divider);
  const result: AdjustableResult = { dividerV };
  const allOn = doc.devices.map(() => true);
  const seen = new Set<ProfileSegment>();
  for (const segment of doc.profile.segments) {
    const drive = segment.electrical;
    if (seen.has(segment) || !drive || segment.durationS === 0) continue;
    seen.add(segment);
    if (Math.abs(drive.voutV - dividerV) > 1e-9 * dividerV) continue;
    const fed = fedDevices(doc, segment);
    if (!fed.includes(d)) continue;
    const op = segmentPower(doc, segment, fed, allOn).operatingPoint!;
    if (result.top && drive.vinV <= result.top.vinV) continue;
    const top = adjustableTopOfRange(divider, drive.vinV, op.dropoutV);
    result.top = { vinV: drive.vinV, currentA: op.currentA, reachableV: top.reachableV, limitedBy: top.limitedBy };
  }
  return result;
}
