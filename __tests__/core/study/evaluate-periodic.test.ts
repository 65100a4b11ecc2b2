import { buildStudyNetwork, evaluateStudy, packageStages, parseStudy } from '@/core/study';
import { compileNetwork, periodicStart } from '@/core/thermal';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { singleRcStudy } from './study-fixtures';

// Single RC: R = 5 K/W, C = 2 J/K, τ = 10 s; pulses of P for tp in every period T.
const R = 5;
const TAU = 10;

function pulses(P: number, tp: number, T: number, extra: Record<string, unknown> = {}) {
  const study = singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: 25, segments: [{ durationS: tp, powerW: { U1: P } }, { durationS: T - tp, powerW: {} }], ...extra });
  study.profile.periodic = true;
  return study;
}

describe('evaluateStudy periodic steady state', () => {
  it('gives the exact Foster peak of periodic pulses P R (1 − e^(−tp/τ)) / (1 − e^(−T/τ))', () => {
    // PHYSICS.md §3, exact for a one-term network.
    const [P, tp, T] = [20, 2, 10];
    const r = evaluateStudy(parseStudy(pulses(P, tp, T)));
    const exact = 25 + (P * R * (1 - Math.exp(-tp / TAU))) / (1 - Math.exp(-T / TAU));
    assertInDelta(r.devices.U1.peakJunctionC, exact, 1e-9, 'peak');
    assertInDelta(r.devices.U1.peakTimeS, tp, 1e-9, 'peak time');
    expect(r.solver.periodic).toMatchObject({ converged: true, iterations: 1 });
    expect(r.solver.periodic!.residualK).toBeLessThan(1e-9);
  });

  it('reaches the same state on the event-driven path by iteration', () => {
    const [P, tp, T] = [20, 2, 10];
    const exact = 25 + (P * R * (1 - Math.exp(-tp / TAU))) / (1 - Math.exp(-T / TAU));
    const r = evaluateStudy(parseStudy(pulses(P, tp, T)), { forceEventDriven: true });
    assertInDelta(r.devices.U1.peakJunctionC, exact, 1e-6, 'peak');
    expect(r.solver.method).toBe('event-driven');
    expect(r.solver.periodic!.converged).toBe(true);
  });

  it('starts from the periodic state of the thermal core on a slow sink (τ ≈ 1,300 periods)', () => {
    // Cross-check against the thermal core's periodicStart; plain period-by-period repetition would need thousands of periods.
    const study = pulses(30, 1, 10);
    study.sinks[0].capacityJPerK = 4000;
    const doc = parseStudy(study);
    const net = buildStudyNetwork(doc, doc.devices.map((d) => packageStages(d.package)), [3]);
    const model = compileNetwork(net.spec);
    const start = periodicStart(model, [{ u: [30, 25], h: 1 }, { u: [0, 25], h: 9 }]);
    const junction = model.nodeIndex.get(net.junctions[0])!;
    for (const forceEventDriven of [false, true]) {
      const r = evaluateStudy(doc, { forceEventDriven, boundaryRows: 10, seriesPoints: 0 });
      const t0 = r.table!.values[1 + r.table!.columns.indexOf('U1.junction')];
      assertInDelta(t0, start[junction], 1e-5, `start, event-driven ${forceEventDriven}`);
      expect(r.solver.periodic!.iterations).toBeLessThan(10);
    }
  });

  it('settles at once when no node holds heat: every node follows Ta + P·R', () => {
    // Massless network: the temperature is the series sum at each instant (textbook), 25 + 28·5 = 165 °C.
    const study = pulses(28, 5, 10);
    study.devices[0].package.capacityJPerK = 0;
    for (const forceEventDriven of [false, true]) {
      const r = evaluateStudy(parseStudy(study), { forceEventDriven });
      assertInDelta(r.devices.U1.peakJunctionC, 25 + 28 * R, 1e-9, `peak, event-driven ${forceEventDriven}`);
      expect(r.solver.periodic).toMatchObject({ converged: true, iterations: 1 });
    }
  });
});
