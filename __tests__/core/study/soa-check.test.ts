import { checkOperatingPoints, type SoaOperatingPoint, type SoaParameters } from '@/core/soa';
import { evaluateStudy, parseStudy, type StudyResult } from '@/core/study';
import { assertInDelta } from '../../helpers/assert-in-delta';

// PHYSICS.md §4 construction: Ic,max 15 A, Pmax = (150 − Tc)/1.5 W, Is/b = 1.2 (Vce/60)^−2 A derated 0.5 %/K, Vceo 100 V.
const bipolar: SoaParameters = {
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 100,
  rthJcKPerW: 1.5,
  secondBreakdown: { referenceVceV: 60, referenceIcA: 1.2, exponent: 2, derating: { kind: 'linear', fractionPerK: 0.005 } },
};

const RCS = 0.3;

/**
 * One massless device (lumped Rθjc without capacity) on a sink of 400 J/K and 1 K/W at 25 °C:
 * the sink is the only capacity, so each stretch is a first-order RC response, monotone in
 * time (textbook), and the case sits at Tc = Ts + P·Rcs/n.
 */
function study(segments: object[], count = 1): Record<string, any> {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'SOA on a solved profile',
    ambient: { temperatureC: 25 },
    sinks: [{ id: 'S1', rthKPerW: 1, capacityJPerK: 400 }],
    devices: [
      {
        id: 'Q1',
        tjMaxC: 150,
        sink: 'S1',
        count,
        kind: 'bipolar',
        package: { kind: 'lumped', rthKPerW: 1.5 },
        interface: { rthKPerW: RCS },
        soa: bipolar,
      },
    ],
    profile: { segments },
  };
}

const segments = [
  { durationS: 300, vinV: 40, voutV: 20, iloadA: 2 },
  { durationS: 200, vinV: 40, voutV: 10, iloadA: 1 },
  { durationS: 100, vinV: 40, voutV: 5, iloadA: 0.8 },
  { durationS: 300, vinV: 40, voutV: 0, iloadA: 0 },
];

/** Sink temperature at time t from the solution's boundary table. */
function sinkAt(r: StudyResult, t: number): number {
  const table = r.table!;
  const width = table.columns.length + 1;
  const col = 1 + table.columns.indexOf('S1.sink');
  for (let k = 0; k < table.rows; k++) if (table.values[k * width] === t) return table.values[k * width + col];
  throw new Error(`no row at ${t} s`);
}

/** The operating points by hand: Vce = Vin − Vout, Ic = Iload/n (PHYSICS.md §4), case from the solution. */
function handPoints(r: StudyResult, n: number, list = segments): SoaOperatingPoint[] {
  const out: SoaOperatingPoint[] = [];
  let t = 0;
  for (const s of list) {
    const p = (s.vinV - s.voutV) * s.iloadA; // PHYSICS.md §1 with Iq = 0, all n parts together
    if (s.iloadA > 0) {
      // Monotone RC response: the highest sink temperature of the stretch is at one of its ends.
      const sink = Math.max(sinkAt(r, t), sinkAt(r, t + s.durationS));
      out.push({ timeS: t, durationS: s.durationS, vceV: s.vinV - s.voutV, icA: s.iloadA / n, caseC: sink + (p / n) * RCS });
    }
    t += s.durationS;
  }
  return out;
}

describe('SOA check of a solved profile', () => {
  it.each([
    ['batch', false, 1],
    ['event-driven', true, 1],
    ['batch, two parts', false, 2],
  ])('equals checkOperatingPoints fed by hand with the case temperatures of the solution (%s)', (_name, forceEventDriven, n) => {
    const r = evaluateStudy(parseStudy(study(segments, n)), { boundaryRows: 10_000, forceEventDriven });
    const hand = handPoints(r, n);
    const expected = checkOperatingPoints(bipolar, hand);
    const soa = r.soa.Q1;
    expect(soa.points).toHaveLength(hand.length);
    soa.points.forEach((p, k) => {
      assertInDelta(p.caseC, hand[k].caseC, 1e-9, `case temperature of point ${k}`);
      expect(p).toMatchObject({ timeS: hand[k].timeS, durationS: hand[k].durationS, vceV: hand[k].vceV, icA: hand[k].icA, limit: expected.limits[k], pulseS: 'dc' });
      assertInDelta(p.margin, expected.margin[k], 1e-9, `margin of point ${k}`);
    });
    expect(soa.worst).toMatchObject({ timeS: expected.worst!.timeS, limit: expected.worst!.limit });
    assertInDelta(soa.worst!.margin, expected.worst!.margin, 1e-9, 'worst margin');
    expect(soa.passed).toBe(expected.passed);
    expect(r.soaPasses).toBe(expected.passed);
  });

  it('puts the worst point on the thermal line by hand, and fails a DC point beyond it, where Tj passes Tj,max too', () => {
    const r = evaluateStudy(parseStudy(study(segments)), { seriesPoints: 0 });
    const soa = r.soa.Q1;
    // PHYSICS.md §4: at DC the allowed current is Pmax/Vce, Pmax = (Tj,max − Tc)/Rθjc; 20 V, 2 A has the least room.
    expect(soa.worst).toMatchObject({ timeS: 0, limit: 'thermal', vceV: 20, icA: 2 });
    assertInDelta(soa.worst!.margin, (150 - soa.worst!.caseC) / 1.5 / 20 / 2, 1e-12, 'thermal-line margin');
    expect(soa.passed).toBe(true);
    expect(r.soaPasses).toBe(true);
    const failed = evaluateStudy(parseStudy(study([{ durationS: 2000, vinV: 40, voutV: 10, iloadA: 2 }])), { seriesPoints: 0 });
    // 60 W holds the case near 25 + 60·1.3 = 103 °C: Pmax ≈ 31 W, about 1 A at 30 V, margin ≈ 0.5.
    expect(failed.soa.Q1.passed).toBe(false);
    expect(failed.soa.Q1.failedPoints).toBe(1);
    expect(failed.soaPasses).toBe(false);
    // The DC thermal line is where Tj reaches Tj,max: beyond it the junction is over its maximum as well.
    expect(failed.devices.Q1.marginToMaxK).toBeLessThan(0);
    expect(failed.warnings.some((w) => /Q1 leaves its safe operating area/.test(w))).toBe(true);
  });

  it('keeps a stretch whole across chart buckets and joins segments that continue it', () => {
    const same = { vinV: 40, voutV: 20, iloadA: 2 };
    const r = evaluateStudy(parseStudy(study([{ durationS: 120, ...same }, { durationS: 180, ...same }, { durationS: 10, vinV: 40, voutV: 0, iloadA: 0 }])));
    // Default chart buckets cut the 300 s into hundreds of pieces; the SOA sees one 300 s stretch.
    expect(r.solver.stretches).toBeGreaterThan(100);
    expect(r.soa.Q1.points.map((p) => [p.timeS, p.durationS])).toEqual([[0, 300]]);
  });

  it('merges identical pulses into one point at the hottest of them, which carries the lowest margin', () => {
    const train = { repeat: 200, segments: [{ durationS: 0.5, vinV: 40, voutV: 10, iloadA: 2 }, { durationS: 1.5, vinV: 40, voutV: 40, iloadA: 0 }] };
    const r = evaluateStudy(parseStudy(study([train])), { boundaryRows: 10_000 });
    const soa = r.soa.Q1;
    expect(soa.stretches).toBe(200);
    expect(soa.distinctPoints).toBe(1);
    const [p] = soa.points;
    expect(p).toMatchObject({ occurrences: 200, firstTimeS: 0, timeS: 398, durationS: 0.5 });
    // The sink warms pulse after pulse: the last pulse is the hottest, its end the highest case (PHYSICS.md §3, RC).
    assertInDelta(p.caseC, sinkAt(r, 398.5) + 60 * RCS, 1e-9, 'hottest case');
    assertInDelta(p.margin, checkOperatingPoints(bipolar, [p]).margin[0], 1e-12, 'margin at that case');
  });

  it('lists at most 500 points, the lowest margins, and always the worst', () => {
    const steps = Array.from({ length: 700 }, (_, k) => ({ durationS: 1, vinV: 40, voutV: 20, iloadA: 0.001 * (k + 1) }));
    const r = evaluateStudy(parseStudy(study(steps)), { seriesPoints: 0 });
    const soa = r.soa.Q1;
    expect(soa.distinctPoints).toBe(700);
    expect(soa.points).toHaveLength(500);
    expect(soa.pointsListedAll).toBe(false);
    const lowest = Math.min(...soa.points.map((p) => p.margin));
    expect(soa.worst!.margin).toBe(lowest);
    // Same Vce, rising Ic on a slowly warming case: the highest current is the worst.
    expect(soa.worst!.icA).toBeCloseTo(0.7, 12);
    expect(soa.points.some((p) => p.timeS === soa.worst!.timeS)).toBe(true);
  });

  it('keeps the worst point when more distinct points arrive than it holds while solving', () => {
    // 20,500 distinct points overflow the 20,000 held; the worst must be the one of all of them, by hand.
    const steps = Array.from({ length: 20_500 }, (_, k) => ({ durationS: 0.01, vinV: 40, voutV: 20, iloadA: 2 - 1e-5 * k }));
    const r = evaluateStudy(parseStudy(study(steps)), { seriesPoints: 0, boundaryRows: 30_000 });
    const soa = r.soa.Q1;
    expect(soa.distinctPoints).toBe(20_500);
    expect(soa.pointsListedAll).toBe(false);
    const expected = checkOperatingPoints(bipolar, handPoints(r, 1, steps)).worst!;
    expect(soa.worst!.timeS).toBe(expected.timeS);
    assertInDelta(soa.worst!.margin, expected.margin, 1e-9, 'worst margin');
  });

  it('ends a stretch at a thermal shutdown and leaves out the time the device is off', () => {
    const doc = study([{ durationS: 400, vinV: 40, voutV: 20, iloadA: 2 }]);
    // A junction capacity makes the trip and resume take time (a massless junction would flip at once).
    doc.devices[0].package.capacityJPerK = 5;
    doc.devices[0].electrical = { thermalShutdown: { tripC: 100, hysteresisK: 10 } };
    const r = evaluateStudy(parseStudy(doc), { seriesPoints: 0 });
    const trips = r.events.filter((e) => e.kind === 'shutdown');
    const resumes = r.events.filter((e) => e.kind === 'resume');
    expect(trips.length).toBeGreaterThan(2);
    // One stretch per time on: from the start or a resume to the next trip or the end (PHYSICS.md §1: the output stops at Tsd).
    const soa = r.soa.Q1;
    expect(soa.stretches).toBe(1 + resumes.length);
    const onTime = trips.reduce((sum, e, k) => sum + e.timeS - (k === 0 ? 0 : resumes[k - 1].timeS), 0) + (resumes.length === trips.length ? 400 - resumes[resumes.length - 1].timeS : 0);
    const listed = soa.points.reduce((sum, p) => sum + p.durationS * p.occurrences, 0);
    assertInDelta(listed, onTime, 1e-6, 'time on, s');
  });

  it('gives boundary curves at the worst case temperature and at 25 °C, the hotter one lower', () => {
    const soa = evaluateStudy(parseStudy(study(segments)), { seriesPoints: 0 }).soa.Q1;
    const { atWorstCase, atReference } = soa.boundaries!;
    expect(atWorstCase.condition).toEqual({ caseC: soa.worst!.caseC, pulseS: 'dc' });
    expect(atReference.condition.caseC).toBe(25);
    // PHYSICS.md §4: the thermal line derates with Tc, so at 20 V the hot boundary lies below the 25 °C one.
    const at = (b: typeof atWorstCase, v: number) => {
      for (const seg of b.segments) {
        for (let k = 0; k + 1 < seg.points.length; k++) {
          const [a, c] = [seg.points[k], seg.points[k + 1]];
          if (a.vceV <= v && v <= c.vceV && c.vceV > a.vceV) return Math.exp(Math.log(a.icA) + (Math.log(v / a.vceV) / Math.log(c.vceV / a.vceV)) * Math.log(c.icA / a.icA));
        }
      }
      return NaN;
    };
    assertInDelta(at(atReference, 20), 125 / 1.5 / 20, 1e-9, 'thermal line at 25 °C, 20 V');
    assertInDelta(at(atWorstCase, 20), soa.worst!.allowedA, 1e-9, 'the worst point sits on its own boundary');
    expect(at(atWorstCase, 20)).toBeLessThan(at(atReference, 20));
  });

  it('names the device field when a datasheet model has no curve for a stretch', () => {
    const doc = study([{ durationS: 10, vinV: 40, voutV: 20, iloadA: 1 }]);
    doc.devices[0].soa = { kind: 'points', transistor: 'bipolar', tjMaxC: 150, curves: [{ pulseS: 0.001, points: [{ vceV: 1, icA: 10 }, { vceV: 50, icA: 1 }] }] };
    expect(() => evaluateStudy(parseStudy(doc))).toThrow(/^devices\[0\]\.soa\.curves: no curve covers a pulse of 10 s/);
  });
});
