import { BOUND_CLUSTER_REL } from './constants';

/**
 * Near-equal modal rates (e.g. the two devices of a symmetric pair) carry large
 * coefficients of opposite sign that cancel; bounding each term alone would be far too
 * loose. Each cluster is bounded through its slowest rate λ_g plus, per member, the exact
 * δ_k(h) = max over [0, h] of e^(−λ_g τ) − e^(−λ_k τ) ≥ 0, attained at
 * τ* = ln(λ_k/λ_g)/(λ_k − λ_g) or at h.
 */
export type ModeClusters = {
  /** Index of the slowest mode of k's cluster. */
  readonly leader: Int32Array;
  /** 1 where mode k is the last of its cluster. */
  readonly last: Uint8Array;
  /** τ* of each member (Infinity for leaders). */
  readonly peakTime: Float64Array;
  /** e^(−λ_g τ*) − e^(−λ_k τ*) (0 for leaders). */
  readonly peakGap: Float64Array;
};

export function clusterModes(rates: Float64Array): ModeClusters {
  const n = rates.length;
  const leader = new Int32Array(n);
  const last = new Uint8Array(n);
  const peakTime = new Float64Array(n).fill(Infinity);
  const peakGap = new Float64Array(n);
  for (let k = 0; k < n; k++) {
    const g = k > 0 && rates[k] <= rates[leader[k - 1]] * (1 + BOUND_CLUSTER_REL) ? leader[k - 1] : k;
    leader[k] = g;
    if (k > 0 && g !== k) last[k - 1] = 0;
    last[k] = 1;
    if (g !== k && rates[k] > rates[g]) {
      const t = Math.log(rates[k] / rates[g]) / (rates[k] - rates[g]);
      peakTime[k] = t;
      peakGap[k] = Math.exp(-rates[g] * t) - Math.exp(-rates[k] * t);
    }
  }
  return { leader, last, peakTime, peakGap };
}

/** δ_k(h) for every mode, given e^(−λ_k h) in decay (offset db); writes gap[gb + k]. */
export function clusterGaps(c: ModeClusters, decay: Float64Array, db: number, h: number, gap: Float64Array, gb: number): void {
  for (let k = 0; k < c.leader.length; k++) {
    const g = c.leader[k];
    gap[gb + k] = g === k ? 0 : h >= c.peakTime[k] ? c.peakGap[k] : decay[db + g] - decay[db + k];
  }
}
