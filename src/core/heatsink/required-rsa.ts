import { checkArray, checkFinite, checkInteger, checkNonNegative, checkObject, checkString } from './check';

/** One device on the sink, steady: powerW per part, resistances per part, `count` parts. */
export type SteadyDevice = {
  id: string;
  powerW: number;
  rjcKPerW: number;
  rcsKPerW: number;
  tjTargetC: number;
  count?: number;
};

export type RequiredRsa = {
  /** Largest Rθsa that keeps every junction at or below its target, K/W (∞ with no power). */
  rsaKPerW: number;
  /** False when no sink can do it (rsaKPerW ≤ 0); `reason` says why. */
  feasible: boolean;
  /** The device that sets the value (smallest headroom over total power). */
  limitingDevice: string | null;
  totalPowerW: number;
  /** Per device: Tj,target − Ta − P (Rjc + Rcs) − P_total Rθ(enclosure), K, the rise left for the sink. */
  headroomK: Record<string, number>;
  /** With an enclosure: its air's steady rise above the ambient, P_total · Rθ(enclosure), K. */
  enclosureRiseK?: number;
  reason?: string;
};

/**
 * Required sink-to-ambient resistance (PHYSICS.md §5). One device:
 * Rsa = (Tj,target − Ta)/P − Rjc − Rcs. Several on one sink, the sink carrying the total:
 * Rsa = min_k (Tj,target,k − Ta − P_k (Rjc,k + Rcs,k)) / P_total, P_total = Σ count_k P_k.
 *
 * enclosureRthKPerW: the sink leads to the air of an enclosure instead, whose wall all the
 * power crosses in steady state, so the air sits at Ta + P_total · Rθ(enclosure) and
 * Rsa = min_k (Tj,target,k − Ta − P_total Rθ(enclosure) − P_k (Rjc,k + Rcs,k)) / P_total
 * (thermal resistances in series, common practice).
 */
export function requiredRsa(devices: readonly SteadyDevice[], ambientC: number, enclosureRthKPerW?: number): RequiredRsa {
  checkArray(devices, 'devices', 1);
  const ta = checkFinite(ambientC, 'ambientC');
  const renc = enclosureRthKPerW === undefined ? 0 : checkNonNegative(enclosureRthKPerW, 'enclosureRthKPerW');
  let total = 0;
  const checked = devices.map((raw, i) => {
    const path = `devices[${i}]`;
    const d = checkObject(raw, path) as SteadyDevice;
    checkString(d.id, `${path}.id`);
    const p = checkNonNegative(d.powerW, `${path}.powerW`);
    const r = checkNonNegative(d.rjcKPerW, `${path}.rjcKPerW`) + checkNonNegative(d.rcsKPerW, `${path}.rcsKPerW`);
    const count = d.count === undefined ? 1 : checkInteger(d.count, `${path}.count`, 1);
    const target = checkFinite(d.tjTargetC, `${path}.tjTargetC`);
    total += count * p;
    return { d, p, r, target };
  });
  const enclosureRise = total * renc;
  const headroomK: Record<string, number> = {};
  let worst = Infinity;
  let limiting: SteadyDevice | null = null;
  for (const { d, p, r, target } of checked) {
    const headroom = target - ta - p * r - enclosureRise;
    headroomK[d.id] = headroom;
    if (headroom < worst) {
      worst = headroom;
      limiting = d;
    }
  }
  const lim = limiting as SteadyDevice | null;
  const id = lim ? lim.id : null;
  const enclosure = enclosureRthKPerW === undefined ? {} : { enclosureRiseK: enclosureRise };
  if (total === 0) {
    if (worst >= 0) return { rsaKPerW: Infinity, feasible: true, limitingDevice: null, totalPowerW: 0, headroomK, ...enclosure };
    return {
      rsaKPerW: -Infinity,
      feasible: false,
      limitingDevice: id,
      totalPowerW: 0,
      headroomK,
      ...enclosure,
      reason: `device "${id}": its target ${lim!.tjTargetC} °C lies below the ambient ${ta} °C`,
    };
  }
  const rsa = worst / total;
  if (rsa > 0) return { rsaKPerW: rsa, feasible: true, limitingDevice: id, totalPowerW: total, headroomK, ...enclosure };
  const d = lim!;
  return { rsaKPerW: rsa, feasible: false, limitingDevice: d.id, totalPowerW: total, headroomK, ...enclosure, reason: infeasibleReason(d, ta, total, renc) };
}

/** Why even an ideal sink (Rθsa = 0) leaves the limiting device above its target. */
function infeasibleReason(d: SteadyDevice, ta: number, total: number, renc: number): string {
  const allowed = d.tjTargetC - ta;
  if (allowed <= 0) return `device "${d.id}": its target ${d.tjTargetC} °C is not above the ambient ${ta} °C`;
  const path = d.powerW * (d.rjcKPerW + d.rcsKPerW);
  const pathText = `junction to sink alone rises ${fmt(path)} K (P·(Rjc + Rcs) = ${fmt(d.powerW)} W × ${fmt(d.rjcKPerW + d.rcsKPerW)} K/W)`;
  const enclosureRise = total * renc;
  const enclosureText = `the enclosure air rises ${fmt(enclosureRise)} K above the ambient (P_total·Rθ(enclosure) = ${fmt(total)} W × ${fmt(renc)} K/W)`;
  if (renc > 0 && enclosureRise >= allowed) {
    return (
      `device "${d.id}": ${enclosureText} in steady state, which alone uses up the ${fmt(allowed)} K from ambient to target, ` +
      `so no sink can help: lower the power or the enclosure's Rθ (vents, a larger housing), lower the ambient, or raise the target`
    );
  }
  if (path < allowed) {
    // Neither alone, both together (only with an enclosure: the worst headroom is ≤ 0).
    return (
      `device "${d.id}": junction to sink rises ${fmt(path)} K (P·(Rjc + Rcs) = ${fmt(d.powerW)} W × ${fmt(d.rjcKPerW + d.rcsKPerW)} K/W) ` +
      `and ${enclosureText}, together ${fmt(path + enclosureRise)} K, at least the ${fmt(allowed)} K from ambient to target, ` +
      `so even an ideal sink fails: lower the power, the interface or the enclosure's Rθ, or raise the target`
    );
  }
  return (
    `device "${d.id}": ${pathText}, more than the ${fmt(allowed)} K ` +
    `from ambient to target, so even an ideal sink fails: lower the power, the interface or the ambient, or raise the target`
  );
}

function fmt(v: number): string {
  return Number(v.toPrecision(4)).toString();
}
