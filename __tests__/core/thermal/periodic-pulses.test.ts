import { AMBIENT, cauerNetwork, compileNetwork, fosterToCauer, fosterZth, periodicStart, runProfile } from '@/core/thermal';
import type { FosterTerm } from '@/core/thermal';
import { assertInRelDelta } from '../../helpers/assert-in-delta';

const Ta = 25;
const P = 40;

/** Foster set as a network: converted to its Cauer ladder, case held at the ambient. */
function packageModel(terms: FosterTerm[]) {
  const ladder = cauerNetwork(fosterToCauer(terms), 'j', AMBIENT);
  return compileNetwork({ nodes: ladder.nodes, links: ladder.links, heatInputs: [ladder.junctionId] });
}

/** PHYSICS.md §3: periodic steady state of pulses into a Foster set, exact for that network. */
function exactPeakRise(terms: FosterTerm[], tp: number, period: number): number {
  return P * terms.reduce((s, t) => s + (t.rKPerW * -Math.expm1(-tp / t.tauS)) / -Math.expm1(-period / t.tauS), 0);
}

/** The application-note approximation quoted in PHYSICS.md §3. */
function appNotePeakRise(terms: FosterTerm[], tp: number, period: number): number {
  const D = tp / period;
  const rTheta = terms.reduce((s, t) => s + t.rKPerW, 0);
  const z = (t: number) => fosterZth(terms, t);
  return P * (D * rTheta + (1 - D) * z(period + tp) - z(period) + z(tp));
}

function solverPeakRise(terms: FosterTerm[], tp: number, period: number): number {
  const model = packageModel(terms);
  const run = runProfile(
    model,
    { durations: [tp, period - tp], inputs: [P, Ta, 0, Ta] },
    { watchNodes: [0], periodic: true },
  );
  return run.peaks[0].valueC - Ta;
}

const eightTerms: FosterTerm[] = Array.from({ length: 8 }, (_, i) => ({
  tauS: 1e-5 * 10 ** ((6 * i) / 7),
  rKPerW: 0.05 + 0.02 * i,
}));

describe('periodic pulses into a Foster set', () => {
  it.each([
    ['8 terms, 1 ms pulses every 10 ms', eightTerms, 1e-3, 1e-2],
    ['8 terms, 50 ms pulses every 2 s', eightTerms, 0.05, 2],
    ['8 terms, 10 µs pulses every 1 ms', eightTerms, 1e-5, 1e-3],
    ['one term, D = 0.5 at T = τ', [{ rKPerW: 1, tauS: 1 }], 0.5, 1],
  ])('%s: periodic start and exact peak match the closed form', (_, terms, tp, period) => {
    assertInRelDelta(solverPeakRise(terms, tp, period), exactPeakRise(terms, tp, period), 1e-9, 'peak rise');
  });

  it('periodicStart gives the closed-form junction temperature at the start of a period', () => {
    const tp = 2e-3;
    const period = 5e-3;
    const model = packageModel(eightTerms);
    const start = periodicStart(model, [
      { u: [P, Ta], h: tp },
      { u: [0, Ta], h: period - tp },
    ]);
    // Each Foster term decays from its exact peak over the off time (PHYSICS.md §3 formula).
    const expected = eightTerms.reduce(
      (s, t) => s + (P * t.rKPerW * -Math.expm1(-tp / t.tauS) * Math.exp(-(period - tp) / t.tauS)) / -Math.expm1(-period / t.tauS),
      0,
    );
    assertInRelDelta(start[0] - Ta, expected, 1e-9, 'start rise');
  });

  it('application-note approximation agrees when pulses are much shorter than every τ', () => {
    // T ≪ τ_min: the junction only sees the average power D·P, which is what the
    // approximation assumes for all but the last two pulses; both tend to P·D·Rθ.
    const terms = eightTerms.map((t) => ({ ...t, tauS: t.tauS * 100 }));
    const tp = 3e-6;
    const period = 1e-5;
    assertInRelDelta(appNotePeakRise(terms, tp, period), exactPeakRise(terms, tp, period), 2e-3, 'short pulses');
  });

  it('application-note approximation agrees when the period is much longer than every τ', () => {
    // T ≫ τ_max: each pulse starts from equilibrium; both reduce to P·Zth(tp).
    const terms = [{ rKPerW: 0.9, tauS: 1e-3 }];
    assertInRelDelta(appNotePeakRise(terms, 0.01, 0.1), exactPeakRise(terms, 0.01, 0.1), 1e-9, 'long period');
  });

  it('application-note approximation overestimates when the period is near the dominant τ', () => {
    // T ≈ τ: the ripple of the earlier pulses has not decayed, yet the approximation
    // replaces them by their average power. Single term, D = 0.1, T = τ:
    // exact 0.1505 R P against 0.1635 R P (both from the formulas above), about +8.6 %.
    const terms = [{ rKPerW: 1, tauS: 1 }];
    const exact = exactPeakRise(terms, 0.1, 1);
    const approx = appNotePeakRise(terms, 0.1, 1);
    expect((approx - exact) / exact).toBeGreaterThan(0.05);
    assertInRelDelta(solverPeakRise(terms, 0.1, 1), exact, 1e-9, 'solver against exact');
  });

  it('application-note approximation is off by more than 1 % for 8 terms at a low duty cycle', () => {
    // Only the terms with τ near the period carry the neglected ripple; spread over six
    // decades they are a small part of Rθ, so the error is smaller than for one term.
    const tp = 5e-6;
    const period = 1e-4;
    const exact = exactPeakRise(eightTerms, tp, period);
    const approx = appNotePeakRise(eightTerms, tp, period);
    expect(Math.abs(approx - exact) / exact).toBeGreaterThan(0.01);
    assertInRelDelta(solverPeakRise(eightTerms, tp, period), exact, 1e-9, 'solver against exact');
  });
});
