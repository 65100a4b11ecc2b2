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
  /** Per device: Tj,target − Ta − P (Rjc + Rcs), K, the rise left for the sink. */
  headroomK: Record<string, number>;
  reason?: string;
};

/**
 * Required sink-to-ambient resistance (PHYSICS.md §5). One device:
 * Rsa = (Tj,target − Ta)/P − Rjc − Rcs. Several on one sink, the sink carrying the total:
 * Rsa = min_k (Tj,target,k − Ta − P_k (Rjc,k + Rcs,k)) / P_total, P_total = Σ count_k P_k.
 */
export function requiredRsa(devices: readonly SteadyDevice[], ambientC: number): RequiredRsa {
  checkArray(devices, 'devices', 1);
  const ta = checkFinite(ambientC, 'ambientC');
  let total = 0;
  const headroomK: Record<string, number> = {};
  let worst = Infinity;
  let limiting: SteadyDevice | null = null;
  devices.forEach((raw, i) => {
    const path = `devices[${i}]`;
    const d = checkObject(raw, path) as SteadyDevice;
    checkString(d.id, `${path}.id`);
    const p = checkNonNegative(d.powerW, `${path}.powerW`);
    const r = checkNonNegative(d.rjcKPerW, `${path}.rjcKPerW`) + checkNonNegative(d.rcsKPerW, `${path}.rcsKPerW`);
    const count = d.count === undefined ? 1 : checkInteger(d.count, `${path}.count`, 1);
    const headroom = checkFinite(d.tjTargetC, `${path}.tjTargetC`) - ta - p * r;
    headroomK[d.id] = headroom;
    total += count * p;
    if (headroom < worst) {
      worst = headroom;
      limiting = d;
    }
  });
  const lim = limiting as SteadyDevice | null;
  const id = lim ? lim.id : null;
  if (total === 0) {
    if (worst >= 0) return { rsaKPerW: Infinity, feasible: true, limitingDevice: null, totalPowerW: 0, headroomK };
    return {
      rsaKPerW: -Infinity,
      feasible: false,
      limitingDevice: id,
      totalPowerW: 0,
      headroomK,
      reason: `device "${id}": its target ${lim!.tjTargetC} °C lies below the ambient ${ta} °C`,
    };
  }
  const rsa = worst / total;
  if (rsa > 0) return { rsaKPerW: rsa, feasible: true, limitingDevice: id, totalPowerW: total, headroomK };
  const d = lim!;
  const allowed = d.tjTargetC - ta;
  const reason =
    allowed <= 0
      ? `device "${d.id}": its target ${d.tjTargetC} °C is not above the ambient ${ta} °C`
      : `device "${d.id}": junction to sink alone rises ${fmt(d.powerW * (d.rjcKPerW + d.rcsKPerW))} K ` +
        `(P·(Rjc + Rcs) = ${fmt(d.powerW)} W × ${fmt(d.rjcKPerW + d.rcsKPerW)} K/W), more than the ${fmt(allowed)} K ` +
        `from ambient to target, so even an ideal sink fails: lower the power, the interface or the ambient, or raise the target`;
  return { rsaKPerW: rsa, feasible: false, limitingDevice: d.id, totalPowerW: total, headroomK, reason };
}

function fmt(v: number): string {
  return Number(v.toPrecision(4)).toString();
}
