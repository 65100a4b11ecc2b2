import { PEAK_SEARCH_ABS_TOL, PROFILE_BLOCK_SIZE, SMALL_EXP_ARG } from './constants';
import type { ExpSumWorkspace } from './exp-sum-roots';
import { expSmall as importedExpSmall } from './exp-small';
import { interiorPeak } from './interior-peak';
import { clusterGaps, type ModeClusters } from './mode-clusters';
import { mayPeakInside } from './profile-kernel';

// Imported bindings compile to property reads through getters under CommonJS (tsx, jest):
// a module-level copy keeps the hot loop's call direct.
const expSmall = importedExpSmall;

/**
 * The peaks-only segment loop, a block of PROFILE_BLOCK_SIZE segments at a time. Modes are
 * independent in modal coordinates, so each mode is stepped through the whole block before
 * the next one (x_k ← x∞_k + e^(−λ_k h)(x_k − x∞_k)); then each watched node sums its modes
 * over the block, and only then are its segments checked in time order. Every inner loop
 * runs over the block rather than over a handful of modes or inputs, which is what makes it
 * fast. The arithmetic and the peak tests are those of runSegments (profile-kernel.ts), so
 * it finds the same peaks; it keeps no per-segment state, hence no boundary records.
 */
export function runSegmentsInBlocks(
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
): void {
  const n = rates.length;
  const nw = peakValue.length;
  const S = durations.length;
  const B = PROFILE_BLOCK_SIZE;
  const small = SMALL_EXP_ARG;
  const tol = PEAK_SEARCH_ABS_TOL;
  // Per mode and segment of the block: decay e, d = x − x∞ at the start and at the end.
  const decay = new Float64Array(n * B);
  const dev = new Float64Array(n * B);
  const devEnd = new Float64Array(n * B);
  const steady = new Float64Array(B);
  const start = new Float64Array(B);
  const end = new Float64Array(B);
  const excess = new Float64Array(B);
  // One segment's values, gathered for the exact tests.
  const d1 = new Float64Array(n);
  const e1 = new Float64Array(n);
  const gap1 = new Float64Array(n);
  const found = new Float64Array(2);
  // Up to four inputs (three parts and the ambient), transposed per block and padded with
  // zero inputs: x∞_k = Σ_j F_kj u_j is then four multiply-adds inline, without a loop.
  const unrolled = q <= 4;
  const u = new Float64Array(4 * B);
  const fk = new Float64Array(4);
  const watchAbs = watchRows.map(Math.abs);
  const { leader, last } = clusters;
  let t = 0;
  for (let s0 = 0; s0 < S; s0 += B) {
    const m = Math.min(B, S - s0);
    for (let i = 0; i < m; i++) {
      start[i] = t;
      t += durations[s0 + i];
    }
    if (unrolled) {
      for (let j = 0; j < q; j++) for (let i = 0, at = s0 * q + j; i < m; i++, at += q) u[j * B + i] = inputs[at];
    }
    for (let k = 0; k < n; k++) {
      const kb = k * B;
      const pb = kb - B;
      const rate = rates[k];
      const gapRate = k > 0 ? rate - rates[k - 1] : rate;
      // x∞_k = Σ_j F_kj u_j per segment: four multiply-adds inline from the transposed inputs
      // (the same expression as steadyOverBlock), or the sum steadyOverBlock leaves in
      // `steady` taken once (c0 = 1, the other terms 0).
      let src = u;
      let c0 = 1;
      let c1 = 0;
      let c2 = 0;
      let c3 = 0;
      let o1 = 0;
      let o2 = 0;
      let o3 = 0;
      if (unrolled) {
        c0 = q > 0 ? columns[k] : 0;
        c1 = q > 1 ? columns[k + n] : 0;
        c2 = q > 2 ? columns[k + 2 * n] : 0;
        c3 = q > 3 ? columns[k + 3 * n] : 0;
        o1 = B;
        o2 = 2 * B;
        o3 = 3 * B;
      } else {
        steadyOverBlock(columns, k, n, q, false, u, inputs, s0, m, steady, fk);
        src = steady;
      }
      let xk = x[k];
      for (let i = 0; i < m; i++) {
        const h = durations[s0 + i];
        const xi = c0 * src[i] + c1 * src[o1 + i] + c2 * src[o2 + i] + c3 * src[o3 + i];
        const d = xk - xi;
        dev[kb + i] = d;
        if (h > 0) {
          // Slow modes and a rate close to the one before (a symmetric pair) take a
          // Taylor polynomial instead of Math.exp, as in runSegments.
          const own = rate * h;
          const step = gapRate * h;
          const e = own <= small ? expSmall(own) : k > 0 && step <= small ? decay[pb + i] * expSmall(step) : Math.exp(-own);
          const de = d * e;
          decay[kb + i] = e;
          devEnd[kb + i] = de;
          xk = xi + de;
        } else {
          // Zero-length segments take no time: the state stays as it is.
          decay[kb + i] = 1;
          devEnd[kb + i] = d;
        }
      }
      x[k] = xk;
    }
    for (let w = 0; w < nw; w++) {
      const base = w * n;
      // a_0 = (W F + D)_w u per segment, then f(h) and the bound of f(τ) − f(h).
      steadyOverBlock(watchSteady, w * q, 1, q, unrolled, u, inputs, s0, m, steady, fk);
      for (let i = 0; i < m; i++) end[i] = steady[i];
      excess.fill(0, 0, m);
      // Four modes per pass over the block, so end and excess are loaded and stored a
      // quarter as often; |d − d_end| from the two stored deviations.
      let k = 0;
      for (; k + 4 <= n; k += 4) {
        const w0 = watchRows[base + k];
        const w1 = watchRows[base + k + 1];
        const w2 = watchRows[base + k + 2];
        const w3 = watchRows[base + k + 3];
        const a0 = watchAbs[base + k];
        const a1 = watchAbs[base + k + 1];
        const a2 = watchAbs[base + k + 2];
        const a3 = watchAbs[base + k + 3];
        const b0 = k * B;
        const b1 = b0 + B;
        const b2 = b1 + B;
        const b3 = b2 + B;
        for (let i = 0; i < m; i++) {
          const e0 = devEnd[b0 + i];
          const e1 = devEnd[b1 + i];
          const e2 = devEnd[b2 + i];
          const e3 = devEnd[b3 + i];
          end[i] += w0 * e0 + w1 * e1 + w2 * e2 + w3 * e3;
          excess[i] += a0 * Math.abs(dev[b0 + i] - e0) + a1 * Math.abs(dev[b1 + i] - e1) + a2 * Math.abs(dev[b2 + i] - e2) + a3 * Math.abs(dev[b3 + i] - e3);
        }
      }
      for (; k < n; k++) {
        const wk = watchRows[base + k];
        const wa = watchAbs[base + k];
        const kb = k * B;
        for (let i = 0; i < m; i++) {
          const e = devEnd[kb + i];
          end[i] += wk * e;
          excess[i] += wa * Math.abs(dev[kb + i] - e);
        }
      }
      let best = peakValue[w];
      let bestAt = peakTime[w];
      for (let i = 0; i < m; i++) {
        const h = durations[s0 + i];
        // f(τ) − f(h) = Σ a_k (e^(−λτ) − e^(−λh)) ≤ Σ |w_k| |d_k| (1 − e^(−λ_k h)).
        if (!(h > 0) || end[i] + excess[i] <= best + tol) continue;
        const a0 = steady[i];
        let f0 = a0;
        let rising = true;
        let falling = true;
        for (let k = 0; k < n; k++) {
          const d = dev[k * B + i];
          d1[k] = d;
          const a = watchRows[base + k] * d;
          f0 += a;
          if (a > 0) rising = false;
          else if (a < 0) falling = false;
        }
        if (f0 > best) {
          best = f0;
          bestAt = start[i];
        }
        if (end[i] > best) {
          best = end[i];
          bestAt = start[i] + h;
        }
        // All a_k of one sign: f is monotone, its ends are its extremes.
        if (rising || falling) continue;
        for (let k = 0; k < n; k++) e1[k] = decay[k * B + i];
        clusterGaps(clusters, e1, 0, h, gap1, 0);
        if (
          mayPeakInside(rates, watchRows, base, d1, e1, gap1, 0, leader, last, a0, best) &&
          interiorPeak(ws, rates, watchRows, base, d1, a0, h, found) &&
          found[0] > best
        ) {
          best = found[0];
          bestAt = start[i] + found[1];
        }
      }
      peakValue[w] = best;
      peakTime[w] = bestAt;
    }
  }
}

/**
 * out[i] = Σ_j c_j u_j(s0 + i) over a block, c_j = coef[first + j·stride]: four
 * multiply-adds from the transposed, zero-padded inputs u when there are at most four
 * inputs, a loop over the inputs otherwise.
 */
function steadyOverBlock(
  coef: Float64Array,
  first: number,
  stride: number,
  q: number,
  unrolled: boolean,
  u: Float64Array,
  inputs: Float64Array,
  s0: number,
  m: number,
  out: Float64Array,
  c: Float64Array,
): void {
  if (unrolled) {
    for (let j = 0; j < 4; j++) c[j] = j < q ? coef[first + j * stride] : 0;
    const c0 = c[0];
    const c1 = c[1];
    const c2 = c[2];
    const c3 = c[3];
    const B = u.length / 4;
    for (let i = 0; i < m; i++) out[i] = c0 * u[i] + c1 * u[B + i] + c2 * u[2 * B + i] + c3 * u[3 * B + i];
    return;
  }
  out.fill(0, 0, m);
  for (let j = 0; j < q; j++) {
    const cj = coef[first + j * stride];
    for (let i = 0, at = s0 * q + j; i < m; i++, at += q) out[i] += cj * inputs[at];
  }
}
