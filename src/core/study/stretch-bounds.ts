import type { ModalModel } from '../thermal';

/**
 * Cheap bounds of node temperatures over a constant-input stretch, to skip exact peak and
 * crossing searches that cannot matter. In modal form T_k(τ) = a0 + Σ a_i e^(−λ_i τ)
 * (PHYSICS.md §3); each term moves monotonically from a_i to a_i e^(−λ_i h), so the sum of
 * the larger (smaller) ends bounds T_k on [0, h] from above (below).
 */
export type StretchBounds = {
  /** Prepares the modal amplitudes of state T under inputs u over length h. */
  load(T: ArrayLike<number>, u: ArrayLike<number>, h: number): void;
  upper(node: number): number;
  lower(node: number): number;
  /** The larger of the node's values at the two ends of the stretch (a lower bound of its maximum). */
  endMax(node: number): number;
  /**
   * The node's maximum over the stretch to within tolK on the hot side (never below it), by
   * branch and bound on the same bounds over halved sub-stretches; NaN when that would take
   * more than MAX_BOUND_STEPS steps (the exact search must run). With `reached`, also the
   * highest value the search met on the curve and its time in the stretch ([value, τ]): a
   * point of the solution within tolK below the maximum.
   */
  maxWithin(node: number, tolK: number, reached?: Float64Array): number;
};

/** Sub-stretches maxWithin may bound before it gives up. */
const MAX_BOUND_STEPS = 256;

export function createStretchBounds(model: ModalModel): StretchBounds {
  const { modeCount: n, nodeCount: N, inputCount: q, rates } = model;
  const P = model.modesFromTemperatures;
  const F = model.modesFromInputs;
  const W = model.outputFromModes;
  const D = model.outputFromInputs;
  const dx = new Float64Array(n);
  const xInf = new Float64Array(n);
  const decay = new Float64Array(n);
  let uRef: ArrayLike<number> = [];
  let hRef = 0;

  function load(T: ArrayLike<number>, u: ArrayLike<number>, h: number): void {
    uRef = u;
    hRef = h;
    for (let i = 0; i < n; i++) {
      let x = 0;
      for (let j = 0; j < N; j++) x += P[i * N + j] * T[j];
      let xi = 0;
      for (let j = 0; j < q; j++) xi += F[i * q + j] * u[j];
      xInf[i] = xi;
      dx[i] = x - xi;
      decay[i] = Math.exp(-rates[i] * h);
    }
  }

  function bound(node: number, sign: 1 | -1): number {
    let v = 0;
    for (let j = 0; j < q; j++) v += D[node * q + j] * uRef[j];
    for (let i = 0; i < n; i++) {
      const w = W[node * n + i];
      v += w * xInf[i];
      const a = w * dx[i];
      const b = a * decay[i];
      v += sign > 0 ? Math.max(a, b) : Math.min(a, b);
    }
    return v;
  }

  function endMax(node: number): number {
    let v = 0;
    for (let j = 0; j < q; j++) v += D[node * q + j] * uRef[j];
    let start = 0;
    let end = 0;
    for (let i = 0; i < n; i++) {
      const w = W[node * n + i];
      v += w * xInf[i];
      start += w * dx[i];
      end += w * dx[i] * decay[i];
    }
    return v + Math.max(start, end);
  }

  const coef = new Float64Array(n);
  const stack = new Float64Array(2 * (MAX_BOUND_STEPS + 2));
  /** e^(−λ_i t) at both ends of each stacked interval (2n per interval): each end's exponentials are computed once. */
  const ends = new Float64Array((MAX_BOUND_STEPS + 2) * 2 * n);
  const valueAt = (v: number, at: number) => {
    let s = v;
    for (let i = 0; i < n; i++) s += coef[i] * ends[at + i];
    return s;
  };

  /**
   * Over [t0, t1] each term a_i e^(−λ_i τ) lies between its end values, so their larger ends
   * bound T there; the values at the ends are reached. An interval whose bound lies within
   * tolK of the best value reached is settled at its bound; the others are halved.
   *
   * Two bounds, the smaller kept: the terms' larger ends, and the slopes. T' is a sum of
   * monotone terms too, so its extremes on [t0, t1] lie between smin and smax; T then lies
   * below both lines T(t0) + smax (t − t0) and T(t1) − smin (t1 − t), whose lower envelope
   * peaks at an end or where they cross.
   */
  function maxWithin(node: number, tolK: number, reached?: Float64Array): number {
    let v = 0;
    for (let j = 0; j < q; j++) v += D[node * q + j] * uRef[j];
    for (let i = 0; i < n; i++) {
      const w = W[node * n + i];
      v += w * xInf[i];
      coef[i] = w * dx[i];
    }
    let top = 0;
    stack[top++] = 0;
    stack[top++] = hRef;
    // e^(−λ·0) = 1 and e^(−λh), the latter as load computed it (the same expression, the same bits).
    for (let i = 0; i < n; i++) {
      ends[i] = 1;
      ends[n + i] = decay[i];
    }
    const atStart = valueAt(v, 0);
    const atEnd = valueAt(v, n);
    let best = atStart >= atEnd ? atStart : atEnd;
    let bestAt = atStart >= atEnd ? 0 : hRef;
    let settled = -Infinity;
    for (let steps = 0; top > 0; steps++) {
      if (steps > MAX_BOUND_STEPS || top + 4 > stack.length) return NaN;
      const t1 = stack[--top];
      const t0 = stack[--top];
      // Interval top/2 sits at ends[top·n ...]: e(t0) then e(t1).
      const e0 = top * n;
      const e1 = e0 + n;
      let s = v;
      let f0 = v;
      let f1 = v;
      let smax = 0;
      let smin = 0;
      for (let i = 0; i < n; i++) {
        const a = coef[i] * ends[e0 + i];
        const b = coef[i] * ends[e1 + i];
        f0 += a;
        f1 += b;
        s += a > b ? a : b;
        const da = -rates[i] * a;
        const db = -rates[i] * b;
        smax += da > db ? da : db;
        smin += da > db ? db : da;
      }
      const len = t1 - t0;
      let slopes = Math.max(Math.min(f0, f1 - smin * len), Math.min(f0 + smax * len, f1));
      if (smax > smin) {
        const cross = (f1 - smin * len - f0) / (smax - smin);
        if (cross > 0 && cross < len) slopes = Math.max(slopes, f0 + smax * cross);
      }
      const u = s < slopes ? s : slopes;
      if (u <= best + tolK) {
        if (u > settled) settled = u;
        continue;
      }
      const mid = 0.5 * (t0 + t1);
      // [t0, mid] stays at this slot (e(t0) in place, e(mid) after it); [mid, t1] goes to the next.
      const next = e0 + 2 * n;
      for (let i = 0; i < n; i++) {
        ends[next + n + i] = ends[e1 + i];
        const e = Math.exp(-rates[i] * mid);
        ends[e1 + i] = e;
        ends[next + i] = e;
      }
      const m = valueAt(v, e1);
      if (m > best) {
        best = m;
        bestAt = mid;
      }
      stack[top++] = t0;
      stack[top++] = mid;
      stack[top++] = mid;
      stack[top++] = t1;
    }
    if (reached) {
      reached[0] = best;
      reached[1] = bestAt;
    }
    return Math.max(best, settled);
  }

  return { load, upper: (node) => bound(node, 1), lower: (node) => bound(node, -1), endMax, maxWithin };
}
