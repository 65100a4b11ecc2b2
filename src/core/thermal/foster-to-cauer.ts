import { checkFosterTerms } from './check-package';
import { FOSTER_TAU_MERGE_REL_TOL, LANCZOS_BREAKDOWN_REL_TOL } from './constants';
import type { CauerStage, FosterTerm } from './types';

/**
 * Cauer ladder (junction first, the last resistance ending at the case) with the same
 * Zth(t) as the Foster set, so that the package can be chained to a sink (PHYSICS.md §3).
 *
 * Inverse eigenvalue route instead of polynomial continued fractions, which lose all
 * accuracy past about six terms: the ladder's S = C^(−1/2) G C^(−1/2) must have eigenvalues
 * λ_i = 1/τ_i and junction components q_1i² = C_1 R_i/τ_i, with 1/C_1 = Σ R_i/τ_i. Its
 * Cholesky factor is upper bidiagonal with entries √(g_i/C_i), √(g_i/C_(i+1)), and comes
 * straight from Golub–Kahan (Lanczos) bidiagonalisation of diag(√λ) started from √(q_1²),
 * with full reorthogonalisation (Golub & Kahan 1965; de Boor & Golub 1978 for the Jacobi
 * inverse problem; both from memory). Reading R and C off that factor needs only products
 * and quotients of positive numbers, so no cancellation.
 *
 * Terms with equal τ (within FOSTER_TAU_MERGE_REL_TOL) are merged; if the iteration runs out
 * of new directions (τ so close that they are numerically one), the ladder is shorter.
 */
export function fosterToCauer(terms: readonly FosterTerm[]): CauerStage[] {
  checkFosterTerms(terms, 'terms');
  const merged = mergeEqualTau(terms);
  const n = merged.length;
  const sigma = Float64Array.from(merged, (t) => 1 / Math.sqrt(t.tauS));
  const weight = Float64Array.from(merged, (t) => t.rKPerW / t.tauS);
  let total = 0;
  for (let i = 0; i < n; i++) total += weight[i];

  const V: Float64Array[] = [];
  const U: Float64Array[] = [];
  const alpha: number[] = [];
  const beta: number[] = [];
  const sigmaMax = Math.max(...sigma);
  V.push(Float64Array.from(weight, (w) => Math.sqrt(w / total)));
  let p = Float64Array.from(V[0], (v, i) => sigma[i] * v);
  for (let j = 0; ; j++) {
    const a = norm(p);
    if (!(a > LANCZOS_BREAKDOWN_REL_TOL * sigmaMax)) break;
    alpha.push(a);
    U.push(scale(p, 1 / a));
    if (j === n - 1) break;
    const r = Float64Array.from(U[j], (v, i) => sigma[i] * v - a * V[j][i]);
    reorthogonalise(r, V);
    const b = norm(r);
    if (!(b > LANCZOS_BREAKDOWN_REL_TOL * sigmaMax)) break;
    beta.push(b);
    V.push(scale(r, 1 / b));
    p = Float64Array.from(V[j + 1], (v, i) => sigma[i] * v - b * U[j][i]);
    reorthogonalise(p, U);
  }

  const stages: CauerStage[] = [];
  let capacity = 1 / total;
  for (let i = 0; i < alpha.length; i++) {
    const g = capacity * alpha[i] * alpha[i];
    stages.push({ rKPerW: 1 / g, capacityJPerK: capacity });
    if (i < beta.length && i + 1 < alpha.length) capacity = g / (beta[i] * beta[i]);
  }
  return stages;
}

function mergeEqualTau(terms: readonly FosterTerm[]): FosterTerm[] {
  const sorted = [...terms].sort((a, b) => a.tauS - b.tauS);
  const out: FosterTerm[] = [];
  for (const t of sorted) {
    const last = out[out.length - 1];
    if (last && t.tauS - last.tauS <= FOSTER_TAU_MERGE_REL_TOL * t.tauS) last.rKPerW += t.rKPerW;
    else out.push({ rKPerW: t.rKPerW, tauS: t.tauS });
  }
  return out;
}

/** Two passes of classical Gram–Schmidt ("twice is enough", Kahan / Parlett, from memory). */
function reorthogonalise(r: Float64Array, basis: Float64Array[]): void {
  for (let pass = 0; pass < 2; pass++) {
    for (const b of basis) {
      let d = 0;
      for (let i = 0; i < r.length; i++) d += r[i] * b[i];
      for (let i = 0; i < r.length; i++) r[i] -= d * b[i];
    }
  }
}

function norm(v: Float64Array): number {
  let m = 0;
  for (let i = 0; i < v.length; i++) m = Math.max(m, Math.abs(v[i]));
  if (m === 0) return 0;
  let s = 0;
  for (let i = 0; i < v.length; i++) s += (v[i] / m) ** 2;
  return m * Math.sqrt(s);
}

function scale(v: Float64Array, f: number): Float64Array {
  return Float64Array.from(v, (x) => x * f);
}
