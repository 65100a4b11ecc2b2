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
  const { decay, equilibrium, steady } = ws;
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

  // x∞ = F u and the watched steady values K u per distinct row, column by column (long inner loops).
  const Fcol = new Float64Array(q * n);
  for (let k = 0; k < n; k++) for (let j = 0; j < q; j++) Fcol[j * n + k] = F[k * q + j];
  for (let r = 0; r < R; r++) {
    const rn = r * n;
    const u0 = rows[r * q];
    for (let k = 0; k < n; k++) equilibrium[rn + k] = Fcol[k] * u0;
    for (let j = 1; j < q; j++) {
      const uj = rows[r * q + j];
      if (uj === 0) continue;
      const col = j * n;
      for (let k = 0; k < n; k++) equilibrium[rn + k] += Fcol[col + k] * uj;
    }
    for (let w = 0; w < nw; w++) {
      let v = 0;
      for (let j = 0; j < q; j++) v += K0[w * q + j] * rows[r * q + j];
      steady[r * nw + w] = v;
    }
  }

  let x = new Float64Array(n);
  let next = new Float64Array(n);
  const d = new Float64Array(n);
  const u = new Float64Array(q);
  const peakC = new Float64Array(nw).fill(-Infinity);
  const peakTimeS = new Float64Array(nw);
  const counts = new Int32Array(nw);
  const tr: Tracker = { peakC, peakTimeS, counts, S, n, ws, W0, leader, gap, cap, hasGroups, d };

  for (let j = 0; j < q; j++) u[j] = inputs[j];
  if (periodic) periodicModes(model, profile, decay, equilibrium, x, DECAYED);
  else coldModes(model, u[q - 1], x);
  const initialC = temperaturesFromModal(model, x, u);

  // One pass over the modes per segment: new state and every watched node's start, end and
  // bound. One and two watched nodes (one or two devices on the sink) get loops of their own
  // with the sums in locals, which runs markedly faster than arrays of sums.
  const start = new Float64Array(nw);
  const end = new Float64Array(nw);
  const bound = new Float64Array(nw);
  let t = 0;
  for (let s = 0; s < S; s++) {
    const h = durations[s];
    if (h === 0) continue;
    const base = durationIndex[s] * n;
    const rn = rowIndex[s] * n;
    const rw = rowIndex[s] * nw;
    if (nw === 2) {
      let s0 = steady[rw];
      let s1 = steady[rw + 1];
      let e0 = s0;
      let b0 = s0;
      let e1 = s1;
      let b1 = s1;
      for (let k = 0; k < n; k++) {
        const xi = equilibrium[rn + k];
        const dk = x[k] - xi;
        const de = dk * decay[base + k];
        next[k] = xi + de;
        const w0 = W0[k];
        const w1 = W0[n + k];
        const a0 = w0 * dk;
        const ae0 = w0 * de;
        const a1 = w1 * dk;
        const ae1 = w1 * de;
        s0 += a0;
        e0 += ae0;
        b0 += a0 > ae0 ? a0 : ae0;
        s1 += a1;
        e1 += ae1;
        b1 += a1 > ae1 ? a1 : ae1;
      }
      if (b0 > peakC[0] + TOL) consider(tr, 0, s0, e0, b0, s, t, h, base, rn, x, equilibrium, decay, steady[rw]);
      if (b1 > peakC[1] + TOL) consider(tr, 1, s1, e1, b1, s, t, h, base, rn, x, equilibrium, decay, steady[rw + 1]);
    } else if (nw === 1) {
      let s0 = steady[rw];
      let e0 = s0;
      let b0 = s0;
      for (let k = 0; k < n; k++) {
        const xi = equilibrium[rn + k];
        const dk = x[k] - xi;
        const de = dk * decay[base + k];
        next[k] = xi + de;
        const a0 = W0[k] * dk;
        const ae0 = W0[k] * de;
        s0 += a0;
        e0 += ae0;
        b0 += a0 > ae0 ? a0 : ae0;
      }
      if (b0 > peakC[0] + TOL) consider(tr, 0, s0, e0, b0, s, t, h, base, rn, x, equilibrium, decay, steady[rw]);
    } else {
      for (let w = 0; w < nw; w++) start[w] = end[w] = bound[w] = steady[rw + w];
      for (let k = 0; k < n; k++) {
        const xi = equilibrium[rn + k];
        const dk = x[k] - xi;
        const de = dk * decay[base + k];
        next[k] = xi + de;
        for (let w = 0; w < nw; w++) {
          const a = W0[w * n + k] * dk;
          const ae = W0[w * n + k] * de;
          start[w] += a;
          end[w] += ae;
          bound[w] += a > ae ? a : ae;
        }
      }
      for (let w = 0; w < nw; w++) {
        if (bound[w] > peakC[w] + TOL) consider(tr, w, start[w], end[w], bound[w], s, t, h, base, rn, x, equilibrium, decay, steady[rw + w]);
      }
    }
    const old = x;
    x = next;
    next = old;
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

type Tracker = {
  peakC: Float64Array;
  peakTimeS: Float64Array;
  counts: Int32Array;
  S: number;
  n: number;
  ws: ScanWorkspace;
  W0: Float64Array;
  leader: Uint8Array;
  gap: Float64Array;
  cap: Float64Array;
  hasGroups: boolean;
  d: Float64Array;
};

/**
 * A segment whose termwise bound could raise node w's peak: tighten the bound by groups,
 * take the end values, and set the segment aside (with its start state x) when its interior
 * could still hold a higher peak.
 */
function consider(
  tr: Tracker,
  w: number,
  start: number,
  end: number,
  bound: number,
  s: number,
  t: number,
  h: number,
  base: number,
  rn: number,
  x: Float64Array,
  equilibrium: Float64Array,
  decay: Float64Array,
  a0: number,
): void {
  const { n, d, peakC, peakTimeS } = tr;
  if (tr.hasGroups) {
    for (let k = 0; k < n; k++) d[k] = x[k] - equilibrium[rn + k];
    bound = Math.min(bound, groupedBound(tr.W0, w * n, d, decay, base, tr.leader, tr.gap, tr.cap, a0, h, n));
  }
  let best = peakC[w];
  if (bound <= best + TOL) return;
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
    const ws = tr.ws;
    const c = w * tr.S + tr.counts[w]++;
    ws.candidateSegment[c] = s;
    ws.candidateBound[c] = bound;
    ws.candidateTime[c] = t;
    for (let k = 0; k < n; k++) ws.snapshots[s * n + k] = x[k];
  }
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
