import { temperaturesFromModal, type ModalModel } from '../thermal';
import { DECAYED_EXPONENT, MODE_GROUP_REL_GAP, PEAK_TOLERANCE_K } from './constants';
import { coldModes, periodicModes } from './modal-start';
import { refinePeaks } from './refine-peaks';
import type { ScanProfile } from './scan-profile';
import { createScanWorkspace, reserveScanWorkspace, type ScanWorkspace } from './scan-workspace';

// Module constants read once: imported bindings can cost a property access in hot loops.
const TOL = PEAK_TOLERANCE_K;
const GROUP_GAP = MODE_GROUP_REL_GAP;
const DECAYED = DECAYED_EXPONENT;

export type ScanResult = {
  /** Maximum of each watched node, °C, at most PEAK_TOLERANCE_K below the exact one. */
  peakC: Float64Array;
  /** When it occurs, s from the profile start. */
  peakTimeS: Float64Array;
  /** Node temperatures at the end of the profile, °C. */
  finalC: Float64Array;
  /** Node temperatures at the start, °C (the periodic start when periodic). */
  initialC: Float64Array;
  /** Segments whose interior was searched (a cost figure). */
  interiorSearches: number;
};

/**
 * Peaks of the watched nodes over a whole profile, in modal coordinates (exact per segment,
 * PHYSICS.md §3): the thermal core's runProfile with watchNodes, specialised for ranking many
 * models on one profile.
 *
 * One pass takes every segment's end values and a bound a_0 + Σ_groups max(A_g, A_g e^(−λ_g h))
 * + slack ≥ max f on [0, h], in O(n) per watched node. Modes with near-equal rates are bounded
 * as one group (identical parts on one sink give such pairs, whose large terms cancel). A
 * segment whose bound exceeds the best end value so far by more than PEAK_TOLERANCE_K is set
 * aside with its state; afterwards only those still able to beat the best are searched, the
 * highest bound first (refinePeaks), so warm-up segments below the final peak cost nothing.
 *
 * Starts with every node at the first segment's ambient, or in the periodic steady state of
 * the profile repeated forever.
 */
export function scanPeaks(
  model: ModalModel,
  profile: ScanProfile,
  watch: Int32Array,
  periodic: boolean,
  ws: ScanWorkspace = createScanWorkspace(),
): ScanResult {
  const { modeCount: n, inputCount: q, rates, outputFromModes: W, steadyFromInputs: K, modesFromInputs: F } = model;
  const { durations, inputs, durationIndex, distinctDurations } = profile;
  if (profile.inputCount !== q) throw new RangeError(`profile.inputCount: the model takes ${q} inputs, the profile has ${profile.inputCount}`);
  const S = durations.length;
  const D = distinctDurations.length;
  const nw = watch.length;
  const R = profile.distinctRows.length / q;
  reserveScanWorkspace(ws, D, R, S, n, nw);
  const { decay, equilibrium, steady, snapshots, candidateSegment, candidateBound, candidateTime } = ws;
  const rows = profile.distinctRows;
  const rowIndex = profile.rowIndex;

  for (let i = 0; i < D; i++) {
    const h = distinctDurations[i];
    for (let k = 0; k < n; k++) {
      const z = rates[k] * h;
      decay[i * n + k] = z > DECAYED ? 0 : Math.exp(-z);
    }
  }
  // Cheap bound first: a_0 + Σ max(a_k, a_k e^(−λ_k h)). Where it is too weak, the grouped one.
  // Group leaders; for the others the slack of bounding them with their leader's rate λ_g:
  // |e^(−λτ) − e^(−λ_g τ)| ≤ (λ − λ_g) min(τ, 1/(e λ_g)).
  const leader = new Uint8Array(n);
  const gap = new Float64Array(n);
  const cap = new Float64Array(n);
  for (let k = 0, lead = 0; k < n; k++) {
    if (k === 0 || rates[k] - rates[lead] > GROUP_GAP * rates[lead]) {
      leader[k] = 1;
      lead = k;
    } else {
      gap[k] = rates[k] - rates[lead];
      cap[k] = 1 / (Math.E * rates[lead]);
    }
  }
  let hasGroups = false;
  for (let k = 0; k < n; k++) if (leader[k] === 0) hasGroups = true;
  const W0 = new Float64Array(nw * n);
  const K0 = new Float64Array(nw * q);
  for (let w = 0; w < nw; w++) {
    for (let k = 0; k < n; k++) W0[w * n + k] = W[watch[w] * n + k];
    for (let j = 0; j < q; j++) K0[w * q + j] = K[watch[w] * q + j];
  }

  for (let r = 0; r < R; r++) {
    for (let k = 0; k < n; k++) {
      let v = 0;
      for (let j = 0; j < q; j++) v += F[k * q + j] * rows[r * q + j];
      equilibrium[r * n + k] = v;
    }
    for (let w = 0; w < nw; w++) {
      let v = 0;
      for (let j = 0; j < q; j++) v += K0[w * q + j] * rows[r * q + j];
      steady[r * nw + w] = v;
    }
  }

  const x = new Float64Array(n);
  const d = new Float64Array(n);
  const u = new Float64Array(q);
  const peakC = new Float64Array(nw).fill(-Infinity);
  const peakTimeS = new Float64Array(nw);
  const counts = new Int32Array(nw);

  for (let j = 0; j < q; j++) u[j] = inputs[j];
  if (periodic) periodicModes(model, profile, decay, equilibrium, x);
  else coldModes(model, u[q - 1], x);
  const initialC = temperaturesFromModal(model, x, u);

  let t = 0;
  for (let s = 0; s < S; s++) {
    const h = durations[s];
    if (h === 0) continue;
    const base = durationIndex[s] * n;
    const rn = rowIndex[s] * n;
    const rw = rowIndex[s] * nw;
    for (let k = 0; k < n; k++) d[k] = x[k] - equilibrium[rn + k];

    let saved = false;
    for (let w = 0; w < nw; w++) {
      const wb = w * n;
      const a0 = steady[rw + w];
      let start = a0;
      let end = start;
      let bound = start;
      for (let k = 0; k < n; k++) {
        const a = W0[wb + k] * d[k];
        const ae = a * decay[base + k];
        start += a;
        end += ae;
        bound += a > ae ? a : ae;
      }
      if (bound > peakC[w] + TOL && hasGroups) bound = Math.min(bound, groupedBound(W0, wb, d, decay, base, leader, gap, cap, a0, h, n));

      let best = peakC[w];
      if (bound <= best + TOL) continue;
      if (start > best) {
        best = start;
        peakTimeS[w] = t;
      }
      if (end > best) {
        best = end;
        peakTimeS[w] = t + h;
      }
      peakC[w] = best;
      if (bound > best + TOL) {
        const c = w * S + counts[w]++;
        candidateSegment[c] = s;
        candidateBound[c] = bound;
        candidateTime[c] = t;
        if (!saved) {
          saved = true;
          for (let k = 0; k < n; k++) snapshots[s * n + k] = x[k];
        }
      }
    }

    for (let k = 0; k < n; k++) x[k] = equilibrium[rn + k] + decay[base + k] * d[k];
    t += h;
  }

  const last = rowIndex[S - 1] * q;
  for (let j = 0; j < q; j++) u[j] = rows[last + j];
  const finalC = temperaturesFromModal(model, x, u);
  const interiorSearches = refinePeaks(model, profile, watch, ws, counts, peakC, peakTimeS);
  for (let w = 0; w < nw; w++) {
    // A profile of zero length: its only instant is the start.
    if (peakC[w] === -Infinity) {
      peakC[w] = initialC[watch[w]];
      peakTimeS[w] = 0;
    }
  }
  return { peakC, peakTimeS, finalC, initialC, interiorSearches };
}

/** a_0 + Σ_groups max(A_g, A_g e^(−λ_g h)) + Σ |a_k| (λ_k − λ_g) min(h, 1/(e λ_g)) ≥ max f on [0, h]. */
function groupedBound(
  W0: Float64Array,
  wb: number,
  d: Float64Array,
  decay: Float64Array,
  base: number,
  leader: Uint8Array,
  gap: Float64Array,
  cap: Float64Array,
  a0: number,
  h: number,
  n: number,
): number {
  let bound = a0;
  let group = 0;
  let groupDecay = 1;
  let slack = 0;
  for (let k = 0; k < n; k++) {
    const a = W0[wb + k] * d[k];
    if (leader[k] === 1) {
      const ge = group * groupDecay;
      bound += (group > ge ? group : ge) + slack;
      group = a;
      groupDecay = decay[base + k];
      slack = 0;
    } else {
      group += a;
      slack += (a < 0 ? -a : a) * gap[k] * (h < cap[k] ? h : cap[k]);
    }
  }
  const ge = group * groupDecay;
  return bound + (group > ge ? group : ge) + slack;
}
