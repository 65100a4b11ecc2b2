import { checkCauerStages } from './check-package';
import { ladderEigenvalues } from './ladder-spectrum';
import type { CauerStage, FosterTerm } from './types';

/**
 * Foster set (ascending τ) with the same Zth(t) as the Cauer ladder (junction first, the
 * last resistance to the case). With S = C^(−1/2) G C^(−1/2) = Q Λ Qᵀ,
 * Zth(s) = (1/C_1) Σ q_1k² / (s + λ_k), so τ_k = 1/λ_k and R_k = q_1k² / (λ_k C_1).
 * The junction weights come from the interlacing eigenvalues μ_j of the ladder with the
 * junction held at the reference, q_1k² = Π_j (λ_k − μ_j) / Π_(i≠k) (λ_k − λ_i)
 * (Golub 1973, "Some modified matrix eigenvalue problems", from memory); both spectra come
 * from ladderEigenvalues, so slow terms keep full relative accuracy.
 */
export function cauerToFoster(stages: readonly CauerStage[]): FosterTerm[] {
  checkCauerStages(stages, 'stages');
  const n = stages.length;
  const g = Float64Array.from(stages, (s) => 1 / s.rKPerW);
  const c = Float64Array.from(stages, (s) => s.capacityJPerK);
  const lambda = ladderEigenvalues(g, c, 0);
  const mu = n > 1 ? ladderEigenvalues(g, c, 1) : new Float64Array(0);
  const terms: FosterTerm[] = [];
  for (let k = n - 1; k >= 0; k--) {
    let w = 1;
    for (let j = 0; j < n - 1; j++) w *= lambda[k] - mu[j];
    for (let i = 0; i < n; i++) if (i !== k) w /= lambda[k] - lambda[i];
    terms.push({ rKPerW: w / (lambda[k] * c[0]), tauS: 1 / lambda[k] });
  }
  return terms;
}
