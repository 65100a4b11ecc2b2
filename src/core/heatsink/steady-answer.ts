import type { CheckedCandidate } from './candidate';
import type { RsaMode } from './candidate-rsa';
import { naturalConvectionSteady } from './natural-convection';
import type { PreparedRanking } from './ranking-setup';
import { requiredRsa, type RequiredRsa } from './required-rsa';

/** The steady worst case over the profile: every segment's powers held forever. */
export type SteadyRequirement = RequiredRsa & {
  /** A segment whose powers set the requirement (−1 when no segment has a duration). */
  segment: number;
};

/**
 * Required Rθsa (PHYSICS.md §5) for the worst of the profile's power rows. With an enclosure,
 * each row's whole power crosses its wall in steady state: the air sits at
 * Ta + P_total · Rθ(enclosure), which each row's requirement counts.
 */
export function steadyRequirement(prep: PreparedRanking, ambientC: number, marginK: number): SteadyRequirement {
  const m = prep.devices.length;
  const renc = prep.enclosure?.rthKPerW;
  let worst: SteadyRequirement | null = null;
  for (let r = 0; r < prep.steadyRowSegment.length; r++) {
    const req = requiredRsa(
      prep.devices.map((d, i) => ({
        id: d.id,
        powerW: prep.steadyRows[r * m + i],
        rjcKPerW: d.rjcKPerW,
        rcsKPerW: d.rcsKPerW,
        tjTargetC: d.tjMaxC - marginK,
        count: d.count,
      })),
      ambientC,
      renc,
    );
    if (worst === null || req.rsaKPerW < worst.rsaKPerW) worst = { ...req, segment: prep.steadyRowSegment[r] };
  }
  if (worst) return worst;
  const headroomK = Object.fromEntries(prep.devices.map((d) => [d.id, d.tjMaxC - marginK - ambientC]));
  return { rsaKPerW: Infinity, feasible: true, limitingDevice: null, totalPowerW: 0, headroomK, ...(renc === undefined ? {} : { enclosureRiseK: 0 }), segment: -1 };
}

/**
 * Worst steady junction margin of a candidate over the power rows, with the sink's own law:
 * Tj = Ta + P_total Rθ(enclosure) + P_total Rθsa + P (Rjc + Rcs), the sink's rise taken above
 * the air it leads to (thermal resistances in series, common practice).
 */
export function steadyMargin(
  prep: PreparedRanking,
  candidate: CheckedCandidate,
  mode: Exclude<RsaMode, { mode: 'none' }>,
  ambientC: number,
  marginK: number,
): { marginK: number; rsaKPerW: number; device: string | null; segment: number } {
  const m = prep.devices.length;
  const renc = prep.enclosure ? prep.enclosure.rthKPerW : 0;
  let worst = { marginK: Infinity, rsaKPerW: NaN, device: null as string | null, segment: -1 };
  for (let r = 0; r < prep.steadyRowSegment.length; r++) {
    let total = 0;
    for (let i = 0; i < m; i++) total += prep.steadyRows[r * m + i] * prep.devices[i].count;
    let rise: number;
    let rsa: number;
    if (mode.mode === 'forced') {
      rsa = mode.rthKPerW;
      rise = rsa * total;
    } else {
      const n = candidate.natural!;
      ({ riseK: rise, rsaKPerW: rsa } = naturalConvectionSteady(n.rthKPerW, n.referenceRiseK, total, n.exponent));
    }
    for (let i = 0; i < m; i++) {
      const d = prep.devices[i];
      const tj = ambientC + total * renc + prep.steadyRows[r * m + i] * (d.rjcKPerW + d.rcsKPerW) + rise;
      const margin = d.tjMaxC - marginK - tj;
      if (margin < worst.marginK) worst = { marginK: margin, rsaKPerW: rsa, device: d.id, segment: prep.steadyRowSegment[r] };
    }
  }
  return worst;
}
