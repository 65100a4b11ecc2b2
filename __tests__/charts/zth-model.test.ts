import { zthAt, zthCurve, zthEquivalent, zthTimeSpan } from '@/charts/zth-model';

import { assertInRelDelta } from '../helpers/assert-in-delta';

/**
 * Step response of a two-stage Cauer ladder by partial fractions, independent of the core:
 * Z(s) = (R1 Y2 + 1) / (s C1 (R1 Y2 + 1) + Y2) with Y2 = s C2 + 1/R2, whose denominator is
 * D(s) = s² R1 C1 C2 + s (R1 C1 / R2 + C1 + C2) + 1/R2 (circuit analysis of the ladder,
 * textbook). Z(s) = Σ r_i / (s − p_i) with r_i = N(p_i) / D'(p_i); Zth(t) = Σ (r_i / −p_i)(1 − e^(p_i t)).
 */
function ladderZth(r1: number, c1: number, r2: number, c2: number, t: number): number {
  const a = r1 * c1 * c2;
  const b = (r1 * c1) / r2 + c1 + c2;
  const c = 1 / r2;
  const disc = Math.sqrt(b * b - 4 * a * c);
  const poles = [(-b + disc) / (2 * a), (-b - disc) / (2 * a)];
  return poles.reduce((z, p) => {
    const n = r1 * (p * c2 + 1 / r2) + 1;
    const dPrime = 2 * a * p + b;
    const residue = n / dPrime;
    return z + (residue / -p) * (1 - Math.exp(p * t));
  }, 0);
}

describe('Zth of a package model', () => {
  it('takes a lumped R with C as one time constant RC', () => {
    // Single RC: τ = R C, Zth(τ) = R (1 − 1/e) (first-order step response, textbook).
    const eq = zthEquivalent({ kind: 'lumped', rthKPerW: 1, capacityJPerK: 0.8 });
    expect(eq.terms).toEqual([{ rKPerW: 1, tauS: 0.8 }]);
    assertInRelDelta(zthAt(eq, 0.8), 1 - Math.exp(-1), 1e-12, 'Zth(τ)');
  });

  it('takes a lumped R without capacity as responding at once', () => {
    const eq = zthEquivalent({ kind: 'lumped', rthKPerW: 1.5 });
    expect(zthAt(eq, 1e-6)).toBe(1.5);
  });

  it('matches the partial-fraction step response of a two-stage Cauer ladder', () => {
    // Invented ladder: 0.2 K/W, 0.01 J/K at the junction; 0.6 K/W, 0.5 J/K towards the case.
    const eq = zthEquivalent({ kind: 'cauer', stages: [{ rKPerW: 0.2, capacityJPerK: 0.01 }, { rKPerW: 0.6, capacityJPerK: 0.5 }] });
    for (const t of [1e-4, 1e-3, 0.01, 0.1, 1]) assertInRelDelta(zthAt(eq, t), ladderZth(0.2, 0.01, 0.6, 0.5, t), 1e-9, `Zth(${t} s)`);
  });

  it('puts a massless stage in series with the one before it, and a massless junction stage at once', () => {
    // Resistances meeting at a node without heat capacity add in series (Kirchhoff, thermal analogue).
    const eq = zthEquivalent({
      kind: 'cauer',
      stages: [
        { rKPerW: 0.1, capacityJPerK: 0 },
        { rKPerW: 0.2, capacityJPerK: 0.01 },
        { rKPerW: 0.4, capacityJPerK: 0 },
        { rKPerW: 0.6, capacityJPerK: 0.5 },
      ],
    });
    expect(eq.instantKPerW).toBe(0.1);
    // What is left is the two-stage ladder 0.2 + 0.4 K/W, 0.01 J/K; 0.6 K/W, 0.5 J/K.
    for (const t of [1e-3, 0.1]) assertInRelDelta(zthAt(eq, t), 0.1 + ladderZth(0.6, 0.01, 0.6, 0.5, t), 1e-9, `Zth(${t} s)`);
    // Steady state: the series sum of every resistance, 1.3 K/W.
    assertInRelDelta(zthAt(eq, 1e4), 1.3, 1e-9, 'Zth(∞)');
  });

  it('spans a decade beyond the time constants, or half the first point to twice the last', () => {
    const eq = zthEquivalent({ kind: 'foster', terms: [{ rKPerW: 0.3, tauS: 0.4 }, { rKPerW: 0.1, tauS: 0.002 }] });
    expect(zthTimeSpan(eq)).toEqual([0.0002, 4]);
    expect(zthTimeSpan(eq, [{ timeS: 1e-3, zthKPerW: 0.05 }, { timeS: 1, zthKPerW: 0.38 }])).toEqual([5e-4, 2]);
    const curve = zthCurve(eq, [1e-3, 1], 4);
    expect(curve.map((p) => p.timeS)).toHaveLength(4);
    // Zth(t) = Σ R (1 − e^(−t/τ)) at t = 1 s (PHYSICS.md §3).
    assertInRelDelta(curve[3].zthKPerW, 0.3 * (1 - Math.exp(-1 / 0.4)) + 0.1 * (1 - Math.exp(-500)), 1e-12, 'Zth(1 s)');
  });
});
