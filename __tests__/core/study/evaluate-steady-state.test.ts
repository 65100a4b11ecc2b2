import { evaluateStudy, parseStudy } from '@/core/study';
import { assertInDelta, assertInRelDelta } from '../../helpers/assert-in-delta';
import { contractStudy, singleRcStudy } from './study-fixtures';

const LONG = 5000; // s: hundreds of time constants, so the end is the steady state to far below 1e-9 K

describe('evaluateStudy steady state', () => {
  it('puts a single lumped device at Ta + P·(Rjc + Rcs + Rsa)', () => {
    // Series thermal resistances add (textbook): 25 + 28·(1.5 + 0.5 + 3) = 165 °C.
    const doc = parseStudy(singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: 25, segments: [{ durationS: LONG, powerW: { U1: 28 } }] }));
    const r = evaluateStudy(doc);
    assertInDelta(r.devices.U1.peakJunctionC, 165, 1e-9, 'Tj');
    // Case = junction − P·Rjc, sink = Ta + P·Rsa.
    assertInDelta(r.devices.U1.peakCaseC, 165 - 28 * 1.5, 1e-9, 'Tc');
    assertInDelta(r.sinks.S1.peakC, 25 + 28 * 3, 1e-9, 'Ts');
    expect(r.devices.U1.marginToMaxK).toBeCloseTo(150 - 165, 9);
    expect(r.devices.U1.marginToTargetK).toBeCloseTo(130 - 165, 9);
  });

  it('adds the enclosure resistance in series', () => {
    // Series sum (textbook): 40 + 10·(0.2 + 0.3 + 1.1 + 2.5) = 81 °C.
    const study = contractStudy();
    study.enclosure = { rthKPerW: 2.5, capacityJPerK: 300 };
    study.profile.segments = [{ durationS: 200000, powerW: { Q1: 10 } }];
    const r = evaluateStudy(parseStudy(study));
    assertInDelta(r.devices.Q1.peakJunctionC, 81, 1e-6, 'Tj');
    assertInDelta(r.enclosure!.peakC, 40 + 10 * 2.5, 1e-6, 'enclosure air');
  });

  it('treats count = 2 parts like two separate identical entries on the same sink', () => {
    // Two identical parts on one sink, each at P: Tj = Ta + P(Rjc + Rcs) + 2P·Rsa (series–parallel sum, textbook).
    const counted = contractStudy();
    counted.devices[0].count = 2;
    counted.devices[0].package = { kind: 'lumped', rthKPerW: 0.6, capacityJPerK: 3 };
    counted.profile.segments = [{ durationS: 20000, powerW: { Q1: 15 } }];
    const separate = contractStudy();
    separate.devices = [0, 1].map((k) => ({ ...counted.devices[0], id: `Q${k + 1}`, count: 1 }));
    separate.profile.segments = [{ durationS: 20000, powerW: { Q1: 15, Q2: 15 } }];
    const a = evaluateStudy(parseStudy(counted));
    const b = evaluateStudy(parseStudy(separate));
    assertInDelta(a.devices.Q1.peakJunctionC, 40 + 15 * (0.6 + 0.3) + 30 * 1.1, 1e-6, 'Tj steady');
    assertInDelta(a.devices.Q1.peakJunctionC, b.devices.Q2.peakJunctionC, 1e-9, 'count vs entries');
    assertInDelta(a.sinks.S1.peakC, b.sinks.S1.peakC, 1e-9, 'sink');
  });

  it('finds the natural-convection steady state ΔT^(1+n) = P·Rref·ΔTref^n within the stated tolerance', () => {
    // Rsa(ΔT) = Rref (ΔTref/ΔT)^n (PHYSICS.md §3) and ΔT = P·Rsa(ΔT) give ΔT = (P Rref ΔTref^n)^(1/(1+n)).
    const P = 40;
    const study = singleRcStudy({ rjc: 0.8, rcs: 0.2, rsa: 1, c: 0, ta: 30, segments: [{ durationS: 20000, powerW: { U1: P } }] });
    study.sinks[0].capacityJPerK = 100;
    study.sinks[0].naturalConvection = { referenceRiseK: 50, exponent: 0.25 };
    const rise = Math.pow(P * 1 * Math.pow(50, 0.25), 1 / 1.25);
    for (const tolerance of [0.01, 0.001]) {
      const r = evaluateStudy(parseStudy(study), { convectionTolerance: tolerance });
      // Rθsa within the tolerance moves ΔT by at most about tolerance/(1 + n) of itself.
      assertInRelDelta(r.sinks.S1.peakC - 30, rise, tolerance, `sink rise at tolerance ${tolerance}`);
      assertInRelDelta(r.devices.U1.peakJunctionC - 30, rise + P * 1.0, tolerance, `junction rise at tolerance ${tolerance}`);
      expect(r.solver.method).toBe('event-driven');
    }
  });

  it('reads a forced-air Rθsa from its curve in log-log', () => {
    // A power law R = 0.8·v^(−0.5) through the points; at 2.25 m/s: 0.8/1.5 = 0.5333 K/W (straight line in log-log).
    const study = contractStudy();
    study.sinks[0] = { id: 'S1', capacityJPerK: 50, forcedAir: { airSpeedMPerS: 2.25, points: [{ airSpeedMPerS: 1, rthKPerW: 0.8 }, { airSpeedMPerS: 4, rthKPerW: 0.4 }] } };
    study.profile.segments = [{ durationS: 5000, powerW: { Q1: 30 } }];
    const r = evaluateStudy(parseStudy(study));
    assertInDelta(r.sinks.S1.peakC, 40 + 30 * (0.8 / 1.5), 1e-6, 'sink');
  });
});
