import { fitFoster } from '../../../src/core/fit';

const zth = (terms: { rKPerW: number; tauS: number }[], t: number) => terms.reduce((z, x) => z + x.rKPerW * (1 - Math.exp(-t / x.tauS)), 0);
const logspace = (a: number, b: number, n: number) => Array.from({ length: n }, (_, i) => a * (b / a) ** (i / (n - 1)));

describe('fitFoster', () => {
  // A Foster network's step response Zth(t) = Σ Ri (1 − e^(−t/τi)) (PHYSICS.md §3). The fit
  // must reproduce sampled curves of known sets.
  it('reproduces a 4-term set spanning 4 decades to 1 % over its points (time constants off the grid), with the same total Rθ', () => {
    const truth = [
      { rKPerW: 0.05, tauS: 2e-4 },
      { rKPerW: 0.12, tauS: 3e-3 },
      { rKPerW: 0.25, tauS: 4e-2 },
      { rKPerW: 0.3, tauS: 0.6 },
    ];
    const points = logspace(1e-5, 10, 40).map((t) => ({ timeS: t, zthKPerW: zth(truth, t) }));
    const fit = fitFoster(points);
    expect(fit.maxRelativeError).toBeLessThan(1e-2);
    const total = fit.terms.reduce((s, t) => s + t.rKPerW, 0);
    expect(total).toBeCloseTo(0.72, 2);
    for (const t of logspace(1e-5, 10, 97)) expect(Math.abs(zth(fit.terms, t) - zth(truth, t)) / zth(truth, t)).toBeLessThan(1e-2);
  });

  it('finds a single time constant exactly when it lies on the grid', () => {
    // τ grid from t_min/10 = 1e-4 to t_max·10 = 10 with 3 per decade includes 1e-2 exactly.
    const points = logspace(1e-3, 1, 10).map((t) => ({ timeS: t, zthKPerW: 2 * (1 - Math.exp(-t / 1e-2)) }));
    const fit = fitFoster(points, { perDecade: 3 });
    expect(fit.rmsRelativeError).toBeLessThan(1e-9);
    const main = fit.terms.reduce((a, b) => (b.rKPerW > a.rKPerW ? b : a));
    expect(main.tauS).toBeCloseTo(1e-2, 12);
    expect(main.rKPerW).toBeCloseTo(2, 9);
  });

  it('reports the residual of noisy datasheet-like points honestly', () => {
    const truth = [{ rKPerW: 0.4, tauS: 5e-3 }, { rKPerW: 0.6, tauS: 0.2 }];
    const noisy = logspace(1e-4, 10, 25).map((t, i) => ({ timeS: t, zthKPerW: zth(truth, t) * (1 + (i % 2 ? 0.02 : -0.02)) }));
    const fit = fitFoster(noisy);
    expect(fit.maxRelativeError).toBeGreaterThan(0.005);
    expect(fit.maxRelativeError).toBeLessThan(0.05);
  });

  it('warns when the points stop before the curve levels off', () => {
    const truth = [{ rKPerW: 0.4, tauS: 5e-3 }, { rKPerW: 0.6, tauS: 0.2 }];
    const early = logspace(1e-4, 0.05, 20).map((t) => ({ timeS: t, zthKPerW: zth(truth, t) }));
    expect(fitFoster(early).warning).toMatch(/still rising/);
    const full = logspace(1e-4, 5, 30).map((t) => ({ timeS: t, zthKPerW: zth(truth, t) }));
    expect(fitFoster(full).warning).toBeUndefined();
  });

  it('names the bad point', () => {
    expect(() => fitFoster([{ timeS: 1e-3, zthKPerW: 0.1 }, { timeS: -1, zthKPerW: 0.2 }])).toThrow('points[1].timeS');
    expect(() => fitFoster([{ timeS: 1e-3, zthKPerW: 0.1 }])).toThrow(/at least 2/);
  });
});
