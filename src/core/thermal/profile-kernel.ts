import { PEAK_SEARCH_ABS_TOL, PROFILE_CACHE_SIZE, SMALL_EXP_ARG } from './constants';
import type { ExpSumWorkspace } from './exp-sum-roots';
import { expSmall as importedExpSmall } from './exp-small';
import { interiorPeak } from './interior-peak';
import { clusterGaps, type ModeClusters } from './mode-clusters';

// Imported bindings compile to property reads through getters under CommonJS (tsx, jest):
// a module-level copy keeps the hot loop's call direct.
const expSmall = importedExpSmall;

/**
 * The segment loop, on typed arrays only so that it stays monomorphic. Cache slots hold
 * x∞ (and each watched node's a_0) per input vector, e^(−λh) per duration, so a repeating
 * pattern of up to about PROFILE_CACHE_SIZE distinct segments computes each only once.
 */
export function runSegments(
  durations: Float64Array,
  inputs: Float64Array,
  rates: Float64Array,
  columns: Float64Array,
  watchRows: Float64Array,
  watchSteady: Float64Array,
  x: Float64Array,
  peakValue: Float64Array,
  peakTime: Float64Array,
  ws: ExpSumWorkspace,
  clusters: ModeClusters,
  q: number,
  onBoundary: ((s: number, t: number) => void) | null,
): void {
  const n = rates.length;
  const nw = peakValue.length;
  // Module bindings read through getters once compiled to CommonJS: keep locals.
  const C = PROFILE_CACHE_SIZE;
  const tol = PEAK_SEARCH_ABS_TOL;
  const small = SMALL_EXP_ARG;
  const cacheU = new Float64Array(C * q).fill(NaN);
  const cacheXInf = new Float64Array(C * n);
  const cacheA0 = new Float64Array(C * nw);
  const cacheH = new Float64Array(C).fill(NaN);
  const cacheDecay = new Float64Array(C * n);
  const cacheGap = new Float64Array(C * n);
  const gapReady = new Uint8Array(C);
  const { leader, last } = clusters;
  const found = new Float64Array(2);
  const dev = new Float64Array(n);
  const devEnd = new Float64Array(n);
  const moveAbs = new Float64Array(n);
  const watchAbs = watchRows.map(Math.abs);
  // Direct-mapped caches indexed by a hash of the raw bits of u and h.
  const durationBits = new Uint32Array(durations.buffer, durations.byteOffset, 2 * durations.length);
  const inputBits = new Uint32Array(inputs.buffer, inputs.byteOffset, 2 * inputs.length);
  const shift = 32 - Math.log2(C);
  let slotU = -1;
  let slotH = -1;
  let t = 0;
  for (let s = 0; s < durations.length; s++) {
    const row = s * q;
    // Same inputs as the last segment is the common case.
    if (slotU < 0 || !sameRow(cacheU, slotU * q, inputs, row, q)) {
      let key = 0;
      for (let j = 0; j < q; j++) key = Math.imul(key ^ inputBits[2 * (row + j)] ^ Math.imul(inputBits[2 * (row + j) + 1], 0x85ebca6b), 0x9e3779b1);
      slotU = key >>> shift;
      if (!sameRow(cacheU, slotU * q, inputs, row, q)) {
        fillInputSlot(slotU, inputs, row, q, n, nw, columns, watchSteady, cacheU, cacheXInf, cacheA0);
      }
    }
    const h = durations[s];
    if (h > 0) {
      if (slotH < 0 || cacheH[slotH] !== h) {
        slotH = Math.imul(durationBits[2 * s] ^ Math.imul(durationBits[2 * s + 1], 0x85ebca6b), 0x9e3779b1) >>> shift;
        if (cacheH[slotH] !== h) {
          cacheH[slotH] = h;
          const slot = slotH * n;
          let previous = 1;
          for (let k = 0; k < n; k++) {
            // Slow modes and a rate close to the one before (a symmetric pair of devices)
            // take a Taylor polynomial instead of Math.exp: about half the exps here.
            const own = rates[k] * h;
            const step = k > 0 ? (rates[k] - rates[k - 1]) * h : own;
            const e = own <= small ? expSmall(own) : step <= small ? previous * expSmall(step) : Math.exp(-own);
            cacheDecay[slot + k] = e;
            previous = e;
          }
          gapReady[slotH] = 0;
        }
      }
      const xb = slotU * n;
      const db = slotH * n;
      // Shared by every watched node: d = x − x∞ at the start and at the end of the segment.
      for (let k = 0; k < n; k++) {
        const xi = cacheXInf[xb + k];
        const d = x[k] - xi;
        const de = d * cacheDecay[db + k];
        dev[k] = d;
        devEnd[k] = de;
        moveAbs[k] = Math.abs(d - de);
        x[k] = xi + de;
      }
      for (let w = 0; w < nw; w++) {
        const base = w * n;
        const a0 = cacheA0[slotU * nw + w];
        let end = a0;
        let excess = 0;
        for (let k = 0; k < n; k++) {
          end += watchRows[base + k] * devEnd[k];
          excess += watchAbs[base + k] * moveAbs[k];
        }
        // f(τ) − f(h) = Σ a_k (e^(−λτ) − e^(−λh)) ≤ Σ |w_k| |d_k| (1 − e^(−λ_k h)).
        let best = peakValue[w];
        if (end + excess <= best + tol) continue;
        let start = a0;
        let rising = true;
        let falling = true;
        for (let k = 0; k < n; k++) {
          const a = watchRows[base + k] * dev[k];
          start += a;
          if (a > 0) rising = false;
          else if (a < 0) falling = false;
        }
        if (start > best) {
          best = start;
          peakTime[w] = t;
        }
        if (end > best) {
          best = end;
          peakTime[w] = t + h;
        }
        // All a_k of one sign: f is monotone, its ends are its extremes.
        if (!rising && !falling) {
          if (gapReady[slotH] === 0) {
            // Only segments that may peak inside need the cluster gaps of their duration.
            clusterGaps(clusters, cacheDecay, db, h, cacheGap, db);
            gapReady[slotH] = 1;
          }
          if (
            mayPeakInside(rates, watchRows, base, dev, cacheDecay, cacheGap, db, leader, last, a0, best) &&
            interiorPeak(ws, rates, watchRows, base, dev, a0, h, found) &&
            found[0] > best
          ) {
            best = found[0];
            peakTime[w] = t + found[1];
          }
        }
        peakValue[w] = best;
      }
      t += h;
    }
    if (onBoundary !== null) onBoundary(s, t);
  }
}

/**
 * True when a segment may peak inside above `best`: the upper bound of f on [0, h] (each
 * cluster of near-equal rates through its slowest one) exceeds it and bounds of f′ do not
 * prove f monotone.
 */
export function mayPeakInside(
  rates: Float64Array,
  watchRows: Float64Array,
  base: number,
  dev: Float64Array,
  decay: Float64Array,
  gap: Float64Array,
  db: number,
  leader: Int32Array,
  last: Uint8Array,
  a0: number,
  best: number,
): boolean {
  let bound = a0;
  let cluster = 0;
  let slack = 0;
  let slope = 0;
  let slopeSlack = 0;
  let slopeLow = 0;
  let slopeHigh = 0;
  for (let k = 0; k < dev.length; k++) {
    const a = watchRows[base + k] * dev[k];
    const c = -rates[k] * a;
    const g = gap[db + k];
    cluster += a;
    slope += c;
    slack += (a < 0 ? -a : a) * g;
    slopeSlack += (c < 0 ? -c : c) * g;
    if (last[k] === 1) {
      const e = decay[db + leader[k]];
      const ce = cluster * e;
      bound += cluster > ce ? cluster : ce;
      const se = slope * e;
      slopeLow += slope < se ? slope : se;
      slopeHigh += slope > se ? slope : se;
      cluster = 0;
      slope = 0;
    }
  }
  if (bound + slack <= best + PEAK_SEARCH_ABS_TOL) return false;
  return !(slopeLow - slopeSlack >= 0 || slopeHigh + slopeSlack <= 0);
}

function sameRow(a: Float64Array, ia: number, b: Float64Array, ib: number, q: number): boolean {
  for (let j = 0; j < q; j++) if (a[ia + j] !== b[ib + j]) return false;
  return true;
}

/** Caches u, x∞ = F u and a_0 = (W F + D)_j u. */
function fillInputSlot(
  slot: number,
  inputs: Float64Array,
  row: number,
  q: number,
  n: number,
  nw: number,
  columns: Float64Array,
  watchSteady: Float64Array,
  cacheU: Float64Array,
  cacheXInf: Float64Array,
  cacheA0: Float64Array,
): void {
  const xb = slot * n;
  for (let j = 0; j < q; j++) cacheU[slot * q + j] = inputs[row + j];
  // Up to four inputs (three parts and the ambient) unrolled: a loop over so few inputs
  // inside the loop over modes costs more than the arithmetic.
  const u0 = inputs[row];
  const u1 = q > 1 ? inputs[row + 1] : 0;
  const u2 = q > 2 ? inputs[row + 2] : 0;
  const u3 = q > 3 ? inputs[row + 3] : 0;
  if (q === 1) {
    for (let k = 0; k < n; k++) cacheXInf[xb + k] = columns[k] * u0;
  } else if (q === 2) {
    for (let k = 0; k < n; k++) cacheXInf[xb + k] = columns[k] * u0 + columns[n + k] * u1;
  } else if (q === 3) {
    for (let k = 0; k < n; k++) cacheXInf[xb + k] = columns[k] * u0 + columns[n + k] * u1 + columns[2 * n + k] * u2;
  } else if (q === 4) {
    for (let k = 0; k < n; k++) {
      cacheXInf[xb + k] = columns[k] * u0 + columns[n + k] * u1 + columns[2 * n + k] * u2 + columns[3 * n + k] * u3;
    }
  } else {
    for (let k = 0; k < n; k++) {
      let v = 0;
      for (let j = 0; j < q; j++) v += columns[j * n + k] * inputs[row + j];
      cacheXInf[xb + k] = v;
    }
  }
  for (let w = 0; w < nw; w++) {
    const b = w * q;
    let v = watchSteady[b] * u0;
    if (q <= 4) {
      if (q > 1) v += watchSteady[b + 1] * u1;
      if (q > 2) v += watchSteady[b + 2] * u2;
      if (q > 3) v += watchSteady[b + 3] * u3;
    } else {
      for (let j = 1; j < q; j++) v += watchSteady[b + j] * inputs[row + j];
    }
    cacheA0[slot * nw + w] = v;
  }
}
