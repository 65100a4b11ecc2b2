import { cauerNetwork, cauerToFoster, compileNetwork, fosterToCauer, fosterZth, zth, zthTerms } from '@/core/thermal';
import type { FosterTerm } from '@/core/thermal';
import { assertInRelDelta } from '../../helpers/assert-in-delta';

// Invented package data: 8 terms, τ from 2 µs to 2 s (6 decades), R rising towards the case.
const terms: FosterTerm[] = Array.from({ length: 8 }, (_, i) => ({
  tauS: 2e-6 * 10 ** ((6 * i) / 7),
  rKPerW: 0.02 + 0.03 * i + 0.01 * (i % 3),
}));
const tauMax = terms[7].tauS;
const rTotal = terms.reduce((s, t) => s + t.rKPerW, 0);
const logTimes = (from: number, to: number, count: number) =>
  Array.from({ length: count }, (_, k) => from * (to / from) ** (k / (count - 1)));

describe('fosterZth', () => {
  it('one term is R (1 − e^(−t/τ)) and the set sums its terms', () => {
    // Foster step response, PHYSICS.md §3 / textbook.
    assertInRelDelta(fosterZth([{ rKPerW: 0.7, tauS: 0.01 }], 0.02), 0.7 * (1 - Math.exp(-2)), 1e-15, 'single');
    const t = 3e-4;
    const direct = terms.reduce((s, term) => s + term.rKPerW * (1 - Math.exp(-t / term.tauS)), 0);
    assertInRelDelta(fosterZth(terms, t), direct, 1e-14, 'sum');
    assertInRelDelta(fosterZth(terms, 1e3 * tauMax), rTotal, 1e-14, 'Zth(∞) = Σ R');
  });
});

describe('fosterToCauer', () => {
  const stages = fosterToCauer(terms);

  it('gives 8 positive stages whose resistances add up to Σ R', () => {
    expect(stages).toHaveLength(8);
    for (const s of stages) {
      expect(s.rKPerW).toBeGreaterThan(0);
      expect(s.capacityJPerK).toBeGreaterThan(0);
    }
    // DC: a ladder's Zth(∞) is its series resistance, a Foster set's is Σ R_i (textbook).
    assertInRelDelta(stages.reduce((s, st) => s + st.rKPerW, 0), rTotal, 1e-13, 'Σ R');
    // Initial slope: dZth/dt(0) = 1/C_1 = Σ R_i/τ_i (both networks, textbook).
    assertInRelDelta(1 / stages[0].capacityJPerK, terms.reduce((s, t) => s + t.rKPerW / t.tauS, 0), 1e-13, '1/C1');
  });

  it('round trip Foster → Cauer → Foster returns the same τ and R', () => {
    const back = cauerToFoster(stages);
    expect(back).toHaveLength(8);
    back.forEach((term, i) => {
      assertInRelDelta(term.tauS, terms[i].tauS, 1e-12, `τ${i}`);
      assertInRelDelta(term.rKPerW, terms[i].rKPerW, 1e-12, `R${i}`);
    });
  });

  it('the ladder chained as a network has the Foster Zth(t) from 1e-7 s to 1e3 τmax (1e-12 relative)', () => {
    // The reference is the analytic Foster sum of the input data.
    const ladder = cauerNetwork(stages, 'j', 'ambient');
    const model = compileNetwork({ nodes: ladder.nodes, links: ladder.links, heatInputs: [ladder.junctionId] });
    let worst = 0;
    for (const t of logTimes(1e-7, 1e3 * tauMax, 200)) {
      const expected = fosterZth(terms, t);
      const got = zth(model, 0, 0, t);
      worst = Math.max(worst, Math.abs(got - expected) / expected);
    }
    // Measured about 5e-15; 1e-12 leaves room for other platforms' exp.
    expect(worst).toBeLessThan(1e-12);
  });

  it('the junction response read back from the compiled ladder is the Foster set', () => {
    const ladder = cauerNetwork(stages, 'j', 'ambient');
    const model = compileNetwork({ nodes: ladder.nodes, links: ladder.links, heatInputs: [ladder.junctionId] });
    const { instantKPerW, terms: read } = zthTerms(model, 0, 0);
    expect(Math.abs(instantKPerW)).toBeLessThan(1e-12);
    read.forEach((term, i) => {
      assertInRelDelta(term.tauS, terms[i].tauS, 1e-11, `τ${i}`);
      assertInRelDelta(term.rKPerW, terms[i].rKPerW, 1e-11, `R${i}`);
    });
  });

  it('stays accurate for 8 terms over 12 decades of τ', () => {
    const wide = Array.from({ length: 8 }, (_, i) => ({ tauS: 1e-7 * 10 ** ((12 * i) / 7), rKPerW: 0.1 + 0.05 * i }));
    const back = cauerToFoster(fosterToCauer(wide));
    back.forEach((term, i) => {
      // Reference: the input data itself.
      assertInRelDelta(term.tauS, wide[i].tauS, 1e-11, `τ${i}`);
      assertInRelDelta(term.rKPerW, wide[i].rKPerW, 1e-11, `R${i}`);
    });
  });

  it('merges terms of equal τ', () => {
    const stagesMerged = fosterToCauer([
      { rKPerW: 0.2, tauS: 1e-3 },
      { rKPerW: 0.3, tauS: 1e-3 },
      { rKPerW: 0.5, tauS: 0.1 },
    ]);
    expect(stagesMerged).toHaveLength(2);
    const back = cauerToFoster(stagesMerged);
    // Reference: the merged Foster set, 0.5 K/W at 1 ms and 0.5 K/W at 100 ms.
    assertInRelDelta(back[0].rKPerW, 0.5, 1e-13, 'R merged');
    assertInRelDelta(back[1].tauS, 0.1, 1e-13, 'τ2');
  });

  it('a single term becomes a single RC stage with C = τ/R', () => {
    const [stage] = fosterToCauer([{ rKPerW: 0.8, tauS: 0.04 }]);
    // One pole: R and C = τ/R (textbook).
    assertInRelDelta(stage.rKPerW, 0.8, 1e-15, 'R');
    assertInRelDelta(stage.capacityJPerK, 0.05, 1e-15, 'C');
  });
});

describe('cauerToFoster', () => {
  it('two-stage ladder matches the closed-form poles of its 2 × 2 system', () => {
    const stages = [
      { rKPerW: 0.5, capacityJPerK: 0.01 },
      { rKPerW: 1.5, capacityJPerK: 0.2 },
    ];
    const [g1, g2] = [2, 1 / 1.5];
    const [c1, c2] = [0.01, 0.2];
    // Eigenvalues of C⁻¹G for G = [[g1, −g1], [−g1, g1 + g2]] by the quadratic formula (textbook).
    const tr = g1 / c1 + (g1 + g2) / c2;
    const det = (g1 * g2) / (c1 * c2);
    const l1 = (tr - Math.sqrt(tr * tr - 4 * det)) / 2;
    const l2 = (tr + Math.sqrt(tr * tr - 4 * det)) / 2;
    const terms = cauerToFoster(stages);
    assertInRelDelta(terms[0].tauS, 1 / l2, 1e-13, 'τ fast');
    assertInRelDelta(terms[1].tauS, 1 / l1, 1e-13, 'τ slow');
    assertInRelDelta(terms[0].rKPerW + terms[1].rKPerW, 2, 1e-13, 'Σ R');
  });
});
