import { buildStudyNetwork, evaluateStudy, packageStages, parseStudy, type StudyResult } from '@/core/study';
import { SERIES_BUCKET_TOL_K } from '@/core/study/constants';
import { bucketsForPoints } from '@/core/study/series-recorder';
import { compileNetwork, fosterZth, simulateTrapezoidal } from '@/core/thermal';
import { assertInDelta } from '../../helpers/assert-in-delta';
import { seededRandom } from '../../helpers/seeded-random';
import { contractStudy, singleRcStudy, twoDeviceStudy } from './study-fixtures';

/** Column of the result table at the row whose time is t (rows are exact boundary values). */
function valueAt(r: StudyResult, column: string, t: number): number {
  const table = r.table!;
  const width = table.columns.length + 1;
  const c = table.columns.indexOf(column);
  for (let row = 0; row < table.rows; row++) {
    if (Math.abs(table.values[row * width] - t) < 1e-9) return table.values[row * width + 1 + c];
  }
  throw new Error(`no row at t = ${t}`);
}

// Single RC: R = 1.5 + 0.5 + 3 = 5 K/W, C = 2 J/K, τ = RC = 10 s.
const rc = (segments: object[], ta = 25) => singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta, segments });
const TAU = 10;
const R = 5;

describe('evaluateStudy transients', () => {
  it('follows the first-order step response Ta + P R (1 − e^(−t/RC))', () => {
    // Textbook first-order response to a power step, checked at every segment boundary.
    const P = 12;
    const doc = parseStudy(rc([3, 4, 8, 15].map((h) => ({ durationS: h, powerW: { U1: P } }))));
    const r = evaluateStudy(doc, { boundaryRows: 100, seriesPoints: 0 });
    for (const t of [3, 7, 15, 30]) {
      assertInDelta(valueAt(r, 'U1.junction', t), 25 + P * R * (1 - Math.exp(-t / TAU)), 1e-9, `Tj(${t})`);
    }
    assertInDelta(r.devices.U1.peakJunctionC, 25 + P * R * (1 - Math.exp(-30 / TAU)), 1e-9, 'peak');
    expect(r.devices.U1.peakTimeS).toBeCloseTo(30, 9);
  });

  it('measures the time above target from the closed-form crossing times', () => {
    // Heating: Tj reaches 130 °C at τ ln(PR / (PR − 105)); cooling from Tj(60) back to 130 takes τ ln((Tj(60) − Ta)/(130 − Ta)).
    const P = 28;
    const doc = parseStudy(rc([{ durationS: 60, powerW: { U1: P } }, { durationS: 60, powerW: {} }]));
    const up = TAU * Math.log((P * R) / (P * R - 105));
    const t60 = 25 + P * R * (1 - Math.exp(-6));
    const down = TAU * Math.log((t60 - 25) / 105);
    const r = evaluateStudy(doc);
    assertInDelta(r.devices.U1.timeAboveTargetS, 60 - up + down, 1e-6, 'time above 130 °C');
    expect(r.meetsTarget).toBe(false);
  });

  it('follows a step of the ambient profile with the first-order response', () => {
    // Ambient steps 25 → 35 °C at 100 s: Tj = 35 − 10 e^(−(t − 100)/τ) (textbook first-order response).
    const study = rc([{ durationS: 100, powerW: {} }, { durationS: 50, powerW: {} }, { durationS: 150, powerW: {} }]);
    study.ambient = { profile: [{ timeS: 0, temperatureC: 25 }, { timeS: 100, temperatureC: 35 }] };
    const r = evaluateStudy(parseStudy(study), { boundaryRows: 10000 });
    assertInDelta(valueAt(r, 'U1.junction', 100), 25, 1e-9, 'Tj(100)');
    assertInDelta(valueAt(r, 'U1.junction', 150), 35 - 10 * Math.exp(-5), 1e-9, 'Tj(150)');
    expect(r.ambient).toEqual({ minC: 25, maxC: 35 });
  });

  it('follows a linear ambient ramp within the ramp-step tolerance', () => {
    // First-order lag driven by a ramp of slope k (textbook): T = Ta0 + k (t − τ (1 − e^(−t/τ))).
    const study = rc([{ durationS: 100, powerW: {} }], 20);
    study.ambient = { interpolation: 'linear', profile: [{ timeS: 0, temperatureC: 20 }, { timeS: 100, temperatureC: 30 }] };
    const r = evaluateStudy(parseStudy(study), { boundaryRows: 10000 });
    const exact = 20 + 0.1 * (100 - TAU * (1 - Math.exp(-10)));
    // Pieces of at most 0.05 K held at their mean: the lagged answer stays within half a step.
    assertInDelta(valueAt(r, 'U1.junction', 100), exact, 0.025, 'Tj(100)');
  });

  it('chains a Foster package so that a near-isothermal case gives Tj − Ta = P·Zth(t)', () => {
    // Foster Zth(t) = Σ R (1 − e^(−t/τ)) (PHYSICS.md §3) holds with the case held at a fixed temperature;
    // a 1 µK/W interface on a 1e9 J/K sink holds it within 1e-5 K here.
    const terms = [{ rKPerW: 0.05, tauS: 2e-4 }, { rKPerW: 0.15, tauS: 4e-3 }, { rKPerW: 0.3, tauS: 0.05 }, { rKPerW: 0.2, tauS: 0.6 }];
    const study = contractStudy();
    study.devices[0].package = { kind: 'foster', terms };
    study.devices[0].interface.rthKPerW = 1e-6;
    study.sinks[0] = { id: 'S1', rthKPerW: 1, capacityJPerK: 1e9 };
    const times = [1e-4, 1e-3, 1e-2, 0.1, 1, 3];
    study.profile.segments = times.map((t, k) => ({ durationS: t - (k ? times[k - 1] : 0), powerW: { Q1: 10 } }));
    const r = evaluateStudy(parseStudy(study), { boundaryRows: 100, seriesPoints: 0 });
    for (const t of times) assertInDelta(valueAt(r, 'Q1.junction', t) - 40, 10 * fosterZth(terms, t), 2e-5, `rise at ${t} s`);
  });

  it('agrees with the trapezoidal integrator on a two-sink study with an enclosure', () => {
    // Cross-check against a second integrator (Crank–Nicolson, second order) on the same network.
    const rand = seededRandom(7);
    const study = twoDeviceStudy();
    study.profile.segments = Array.from({ length: 12 }, () => ({ durationS: 0.5 + 2 * rand(), powerW: { Q1: 20 * rand(), Q2: 15 * rand() } }));
    const doc = parseStudy(study);
    const r = evaluateStudy(doc);
    const net = buildStudyNetwork(doc, doc.devices.map((d) => packageStages(d.package)), doc.sinks.map((s) => s.rthKPerW));
    const model = compileNetwork(net.spec);
    const watch = net.junctions.map((id) => model.nodeIndex.get(id)!);
    const profile = {
      durations: doc.profile.segments.map((s) => s.durationS),
      inputs: doc.profile.segments.flatMap((s) => [s.powerW.Q1, s.powerW.Q2, 25]),
    };
    const trap = simulateTrapezoidal(net.spec, profile, { dtS: 2e-4, watchNodes: watch });
    assertInDelta(r.devices.Q1.peakJunctionC, trap.peaks[0].valueC, 1e-3, 'Q1 peak');
    assertInDelta(r.devices.Q2.peakJunctionC, trap.peaks[1].valueC, 1e-3, 'Q2 peak');
  });

  it('gives the same answer on the batch and the event-driven path', () => {
    const rand = seededRandom(11);
    const study = twoDeviceStudy();
    study.profile.segments = Array.from({ length: 300 }, () => ({ durationS: 0.01 + rand(), powerW: { Q1: 30 * rand(), Q2: 10 * rand() } }));
    const doc = parseStudy(study);
    const batch = evaluateStudy(doc);
    const stepped = evaluateStudy(doc, { forceEventDriven: true });
    expect(batch.solver.method).toBe('batch');
    for (const id of ['Q1', 'Q2']) {
      assertInDelta(batch.devices[id].peakJunctionC, stepped.devices[id].peakJunctionC, 1e-9, `${id} peak`);
      assertInDelta(batch.devices[id].peakTimeS, stepped.devices[id].peakTimeS, 1e-9, `${id} peak time`);
      assertInDelta(batch.devices[id].timeAboveTargetS, stepped.devices[id].timeAboveTargetS, 1e-9, `${id} time above`);
    }
  });

  it('bounds every chart series to the requested points and keeps the peak in it', () => {
    const rand = seededRandom(3);
    const study = twoDeviceStudy();
    study.profile.segments = Array.from({ length: 20000 }, () => ({ durationS: 0.05 + 0.1 * rand(), powerW: { Q1: 40 * rand(), Q2: 5 } }));
    const r = evaluateStudy(parseStudy(study), { seriesPoints: 500 });
    for (const [key, s] of Object.entries(r.series!)) {
      expect(s.timeS.length).toBeLessThanOrEqual(500);
      expect(s.timeS.length).toBe(s.valueC.length);
      for (let i = 1; i < s.timeS.length; i++) expect(s.timeS[i]).toBeGreaterThanOrEqual(s.timeS[i - 1]);
      expect(key).toMatch(/^(Q1|Q2)\.(junction|case)$|^(S1|S2)\.sink$|^enclosure\.air$|^ambient$/);
    }
    const j = r.series!['Q1.junction'];
    const k = j.valueC.indexOf(Math.max(...j.valueC));
    expect(j.valueC[k]).toBe(r.devices.Q1.peakJunctionC);
    expect(j.timeS[k]).toBe(r.devices.Q1.peakTimeS);
  });

  it('keeps each chart bucket’s maximum within SERIES_BUCKET_TOL_K of the exact one on the event-driven path', () => {
    // Reference: the batch path's bucket maxima, the thermal core's exact peak search over each
    // bucket's pieces (roots of the derivative, PHYSICS.md §3); the event-driven path may settle
    // a bucket from its stretch bounds, on the cool side by at most the tolerance.
    const rand = seededRandom(17);
    const study = twoDeviceStudy();
    study.profile.segments = Array.from({ length: 3000 }, () => ({ durationS: 0.02 + 0.3 * rand(), powerW: { Q1: 40 * rand(), Q2: 12 * rand() } }));
    const doc = parseStudy(study);
    const points = 202;
    const buckets = bucketsForPoints(points);
    const bucketS = doc.profile.segments.reduce((a, s) => a + s.durationS, 0) / buckets;
    const maxima = (r: StudyResult, key: string) => {
      const out = new Float64Array(buckets).fill(-Infinity);
      const { timeS, valueC } = r.series![key];
      timeS.forEach((t, i) => {
        const b = Math.min(buckets - 1, Math.floor(t / bucketS));
        out[b] = Math.max(out[b], valueC[i]);
      });
      return out;
    };
    const batch = evaluateStudy(doc, { seriesPoints: points });
    const stepped = evaluateStudy(doc, { seriesPoints: points, forceEventDriven: true });
    expect(batch.solver.method).toBe('batch');
    for (const key of ['Q1.junction', 'Q1.case', 'Q2.junction', 'Q2.case', 'S1.sink']) {
      const exact = maxima(batch, key);
      const settled = maxima(stepped, key);
      for (let b = 0; b < buckets; b++) {
        expect(settled[b]).toBeLessThanOrEqual(exact[b] + 1e-9);
        expect(settled[b]).toBeGreaterThanOrEqual(exact[b] - SERIES_BUCKET_TOL_K - 1e-9);
      }
    }
    // The overall peaks stay exact.
    for (const id of ['Q1', 'Q2']) assertInDelta(stepped.devices[id].peakJunctionC, batch.devices[id].peakJunctionC, 1e-9, `${id} peak`);
  });
});
