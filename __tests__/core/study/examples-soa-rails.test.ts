import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateStudy, parseStudy, type StudyEvent } from '@/core/study';
import { assertInDelta } from '../../helpers/assert-in-delta';

const example = (name: string) => JSON.parse(readFileSync(join(__dirname, '../../../examples', name), 'utf8'));

describe('bench electronic load (demo): switching MOSFETs in linear mode', () => {
  const json = example('bench-electronic-load.json');
  const r = evaluateStudy(parseStudy(json), { seriesPoints: 0 });

  it('warns for every DC stretch of both MOSFETs: no DC linear-mode rating (PHYSICS.md §4)', () => {
    for (const id of ['Q1', 'Q2']) {
      const soa = r.soa[id];
      expect(soa.transistor).toBe('mosfet');
      // 2 A, 6 A and 8 A steps of 10–20 s, far beyond 5 × the largest τ (0.085 s): DC.
      expect(soa.points.map((p) => p.pulseS)).toEqual(['dc', 'dc', 'dc']);
      expect(soa.warnings).toEqual([expect.objectContaining({ code: 'mosfet-linear-mode', stretches: 3, firstTimeS: 0 })]);
      expect(r.warnings.some((w) => w.startsWith(`${id}: MOSFET in linear mode`))).toBe(true);
    }
  });

  it('passes on the thermal line all the same, the 8 A burst the worst: Vce = Vin − Vout, Ic = Iload/n', () => {
    const w = r.soa.Q1.worst!;
    // PHYSICS.md §4: 30 − 0.4 = 29.6 V, 8 A / 2 parts.
    expect(w).toMatchObject({ timeS: 30, durationS: 10, vceV: 29.6, icA: 4, limit: 'thermal' });
    // The DC curve's thermal run (2.976 V, 120 A) → (100 V, 3.57 A), log-log, derated by (Tj,max − Tc)/(Tj,max − 25).
    const slope = Math.log(3.57 / 120) / Math.log(100 / 2.976);
    const at25 = 120 * Math.pow(29.6 / 2.976, slope);
    assertInDelta(w.allowedA, (at25 * (175 - w.caseC)) / 150, 1e-9, 'allowed at the worst case temperature');
    expect(r.soa.Q1.passed).toBe(true);
    expect(r.soaPasses).toBe(true);
  });

  it('reads its case temperatures from the solution: the hottest lies just under the case peak of the period', () => {
    // Heat stored in the package still reaches the case for a moment after the burst ends, with no current flowing,
    // so the case peak of the period may lie a hair after the last stretch the SOA checks, never below it.
    const hottest = Math.max(...r.soa.Q2.points.map((p) => p.caseC));
    expect(hottest).toBeLessThanOrEqual(r.devices.Q2.peakCaseC + 1e-9);
    assertInDelta(hottest, r.devices.Q2.peakCaseC, 0.01, 'peak case');
  });
});

describe('laboratory supply (demo): two adapters in a rail plan', () => {
  const json = example('lab-supply-two-tap.json');
  const doc = parseStudy(json);
  const r = evaluateStudy(doc, { seriesPoints: 0 });
  const rail = r.railPlan!;
  const [a] = json.railPlan.sources;
  const iq = 2 * json.devices[0].electrical.iqA;
  const [theta] = json.railPlan.thresholdsV;
  const halfH = json.railPlan.hysteresisV / 2;

  it('has its worst case in each tap at (Vtap(I) − Vout,min)·I, by hand (PHYSICS.md §2)', () => {
    const I = json.railPlan.map.ioutMaxA;
    // Series: voltages and resistances add. Plus Vin·Iq of the two parts (PHYSICS.md §1).
    const vSeries = 2 * a.vocV - I * 2 * a.rsOhm;
    const high = rail.worst.taps[1]!;
    expect(high).toMatchObject({ voutV: theta - halfH, currentA: I });
    assertInDelta(high.powerW, (vSeries - (theta - halfH)) * I + vSeries * iq, 1e-9, 'series tap');
    // Parallel with ballast Rb and a diode each: Voc − Vd − I (Rs + Rb)/2; its lowest output is the map's 0 V.
    const branch = json.railPlan.taps[0].circuit.branches[0];
    const vParallel = a.vocV - branch.diodeV - (I * (a.rsOhm + branch.ballastOhm)) / 2;
    assertInDelta(rail.worst.taps[0]!.powerW, (vParallel - 0) * I + vParallel * iq, 1e-9, 'parallel tap');
    expect(rail.worst.overall!.tap).toBe(1);
    // The map never exceeds the worst case it was built for.
    const peak = Math.max(...rail.map.overall.powerW.flat().filter((p): p is number => p !== null));
    expect(peak).toBeLessThanOrEqual(rail.worst.overall!.powerW + 1e-9);
    expect(rail.map.voutV).toHaveLength(61);
    expect(rail.map.overall.powerW[0]).toHaveLength(26);
  });

  it('gives the best threshold Vtap,0(Imax) − Vdropout − h/2 and flags the 21.5 V one as too high (PHYSICS.md §2)', () => {
    const branch = json.railPlan.taps[0].circuit.branches[0];
    const vParallel = a.vocV - branch.diodeV - (3 * (a.rsOhm + branch.ballastOhm)) / 2;
    // 3 A over two parts: 1.5 A each, dropout 2.3 V at 1.5 A.
    assertInDelta(rail.thresholds[0].bestV, vParallel - 2.3 - halfH, 1e-9, 'best threshold');
    expect(rail.thresholds[0].safe).toBe(false);
    expect(r.warnings.some((w) => /Threshold 1 \(21\.5 V\)/.test(w))).toBe(true);
  });

  it('sizes the sink for the worst case: Rsa = (Tj,target − Ta)/P − (Rjc + Rcs)/n (PHYSICS.md §5)', () => {
    const rjc = json.devices[0].package.terms.reduce((s: number, t: { rKPerW: number }) => s + t.rKPerW, 0);
    const expected = (150 - 25 - 35) / rail.worst.overall!.powerW - (rjc + json.devices[0].interface.rthKPerW) / 2;
    assertInDelta(rail.requiredRsa!.givenKPerW!, expected, 1e-12, 'required Rθsa');
    expect(rail.requiredRsa).toMatchObject({ ambientC: 35, tjTargetC: 125 });
  });

  it('warns of chatter: the input droops I·tbreak/Cin, more than the hysteresis, with the output sensed (common practice)', () => {
    assertInDelta(rail.chatter!.droopV, (3 * 0.01) / 0.0047, 1e-12, 'droop');
    expect(rail.chatter!.chatters).toBe(true);
  });

  it('shows dropout, the tap changes and the current limit as events, in time order', () => {
    const kinds = r.events.map((e) => [e.kind, e.timeS]);
    expect(kinds).toEqual([
      ['dropout', 900],
      ['tap-change', 960],
      ['tap-change', 1860],
      ['current-limit', 1860],
    ]);
    const dropout = r.events[0] as Extract<StudyEvent, { kind: 'dropout' }>;
    const branch = json.railPlan.taps[0].circuit.branches[0];
    // PHYSICS.md §1: Vout ≈ Vin − Vdropout, on the parallel tap at 3 A; the sensed output stays below θ + h/2.
    const vin = a.vocV - branch.diodeV - (3 * (a.rsOhm + branch.ballastOhm)) / 2;
    assertInDelta(dropout.voutV, vin - 2.3, 1e-9, 'sagged output');
    expect(dropout.voutV).toBeLessThan(theta + halfH);
    expect(r.events[1]).toMatchObject({ from: 0, to: 1, toName: 'adapters in series' });
    // PHYSICS.md §1: I ≤ n·Ilim(Vin − Vout), two parts at 1.6 A.
    expect(r.events[3]).toMatchObject({ requestedA: 3.5, deliveredA: 3.2 });
    expect(r.eventCounts['tap-change']).toBe(2);
    expect(rail.selection.changes).toBe(2);
    expect(rail.selection.segments.map((s) => s.tap)).toEqual([0, 0, 0, 1, 1, 0, 0]);
  });

  it('checks the bipolar pass transistors against their SOA, one point per segment with current', () => {
    const soa = r.soa.Q1;
    expect(soa.points).toHaveLength(6);
    expect(soa.passed).toBe(true);
    // Ic = Iload / n with n = 2 (PHYSICS.md §4).
    expect(soa.points.map((p) => p.icA)).toEqual([0.5, 1.5, 1.5, 0.5, 1.5, 1.6]);
  });
});

describe('onboard regulator (demo)', () => {
  it('still shows its thermal shutdown cycling as events', () => {
    const r = evaluateStudy(parseStudy(example('onboard-24v-to-5v.json')), { seriesPoints: 0 });
    expect(r.eventCounts.shutdown).toBeGreaterThan(0);
    expect(r.eventCounts.resume).toBeGreaterThan(0);
    expect(r.soa).toEqual({});
    expect(r.soaPasses).toBe(true);
  });
});
