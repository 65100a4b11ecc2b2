import { readdirSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import { evaluateStudy, parseStudy, type StudyResult } from '@/core/study';
import { LESIT_MODEL, cyclesToFailure } from '@/core/reliability';
import { assertInDelta, assertInRelDelta } from '../../helpers/assert-in-delta';
import { contractStudy, singleRcStudy, twoDeviceStudy } from './study-fixtures';

// Single RC: R = 5 K/W, C = 2 J/K, τ = 10 s (massless sink, as in evaluate-periodic.test.ts).
const R = 5;
const TAU = 10;
const TA = 25;

function pulses(P: number, tp: number, T: number, extra: Record<string, unknown> = {}) {
  const study = singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: TA, segments: [{ durationS: tp, powerW: { U1: P } }, { durationS: T - tp, powerW: {} }] });
  study.profile.periodic = true;
  return { ...study, ...extra };
}

/** Periodic pulses into one RC (PHYSICS.md §3): peak P R (1 − e^(−tp/τ))/(1 − e^(−T/τ)) above ambient, then decay over T − tp. */
function exactSwing(P: number, tp: number, T: number) {
  const high = (P * R * (1 - Math.exp(-tp / TAU))) / (1 - Math.exp(-T / TAU));
  const low = high * Math.exp(-(T - tp) / TAU);
  return { rangeK: high - low, meanC: TA + (high + low) / 2 };
}

describe('study lifetime: rainflow of the junction history, Miner damage, life in years', () => {
  it('a periodic pulse train gives one cycle per period of the exact swing, and its LESIT life', () => {
    const [P, tp, T] = [20, 2, 10];
    const study = pulses(P, tp, T, { lifetime: { mission: { hoursPerDay: 8 } } });
    const r = evaluateStudy(parseStudy(study));
    const life = r.lifetime!;
    const d = life.devices.U1;
    const swing = exactSwing(P, tp, T);
    expect(life.counted).toBe('period');
    expect(life.countedS).toBe(T);
    // 8 h a day of a 10 s period: 2,880 periods.
    assertInDelta(life.repeatsPerDay, 2880, 1e-9, 'repeats per day');
    expect(d.cycles).toBe(1);
    assertInDelta(d.largestRangeK, swing.rangeK, 1e-9, 'range');
    const nf = cyclesToFailure(LESIT_MODEL, swing.rangeK, swing.meanC);
    assertInRelDelta(d.damagePerRepeat, 1 / nf, 1e-9, 'damage per period');
    assertInRelDelta(d.lifeYears!, nf / (2880 * 365.25), 1e-9, 'years');
    expect(d.dominant[0]).toMatchObject({ count: 1, damageShare: 1 });
    expect(d.histogram.counts.reduce((a, b) => a + b, 0)).toBe(1);
    expect(r.lifetime!.shortest).toEqual({ device: 'U1', lifeYears: d.lifeYears });
  });

  it('a cold start a day adds one cycle from the ambient to the period peak', () => {
    const [P, tp, T] = [20, 2, 10];
    const study = pulses(P, tp, T, { lifetime: { mission: { hoursPerDay: 8, startsPerDay: 1 } } });
    const d = evaluateStudy(parseStudy(study)).lifetime!.devices.U1;
    const swing = exactSwing(P, tp, T);
    // Peak of the periodic state: the mean plus half the swing; the start cycle runs from 25 °C up to it.
    const peak = swing.meanC + swing.rangeK / 2;
    const start = cyclesToFailure(LESIT_MODEL, peak - TA, (peak + TA) / 2);
    assertInDelta(d.startCycle!.rangeK, peak - TA, 1e-9, 'start range');
    assertInRelDelta(d.damagePerDay, 2880 / cyclesToFailure(LESIT_MODEL, swing.rangeK, swing.meanC) + 1 / start, 1e-9, 'damage per day');
    assertInRelDelta(d.lifeYears!, 1 / (d.damagePerDay * 365.25), 1e-12, 'years');
  });

  it('the event-driven path counts the same cycles', () => {
    const study = pulses(20, 2, 10, { lifetime: { mission: { repeatsPerDay: 1000 } } });
    const batch = evaluateStudy(parseStudy(study)).lifetime!.devices.U1;
    const stepped = evaluateStudy(parseStudy(study), { forceEventDriven: true }).lifetime!.devices.U1;
    expect(stepped.cycles).toBe(batch.cycles);
    assertInRelDelta(stepped.damagePerDay, batch.damagePerDay, 1e-6, 'damage per day');
  });

  it('a larger swing shortens the life (Coffin–Manson: monotonic in ΔTj)', () => {
    const years = [10, 20, 40].map((P) => evaluateStudy(parseStudy(pulses(P, 2, 10, { lifetime: { mission: { hoursPerDay: 24 } } }))).lifetime!.devices.U1.lifeYears!);
    expect(years[1]).toBeLessThan(years[0]);
    expect(years[2]).toBeLessThan(years[1]);
  });

  it('a non-periodic run counts the warm-up from ambient as a half cycle', () => {
    // One 10 s step of 20 W from 25 °C: Tj rises to 25 + 100 (1 − e^−1) = 88.212 °C and stays:
    // one half cycle of that rise (ASTM E1049 §5.4.4 step 6).
    const study = singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: TA, segments: [{ durationS: 10, powerW: { U1: 20 } }] });
    const r = evaluateStudy(parseStudy({ ...study, lifetime: { mission: { repeatsPerDay: 4 } } }));
    const d = r.lifetime!.devices.U1;
    const rise = 100 * (1 - Math.exp(-1));
    expect(r.lifetime!.counted).toBe('run');
    expect(d.cycles).toBe(0.5);
    assertInDelta(d.largestRangeK, rise, 1e-9, 'rise');
    assertInRelDelta(d.damagePerDay, (4 * 0.5) / cyclesToFailure(LESIT_MODEL, rise, TA + rise / 2), 1e-9, 'damage per day');
  });

  it('a steady junction has no damage and no finite life; its Arrhenius factor follows AF', () => {
    // Steady 10 W into R = 5 K/W from 25 °C: Tj = 75 °C throughout (periodic steady state).
    const study = pulses(10, 5, 10, { lifetime: { mission: { hoursPerDay: 12 }, arrhenius: { referenceC: 55, activationEnergyEV: 0.7 } } });
    study.profile.segments = [{ durationS: 10, powerW: { U1: 10 } }];
    const d = evaluateStudy(parseStudy(study)).lifetime!.devices.U1;
    expect(d.cycles).toBe(0);
    expect(d.lifeYears).toBeNull();
    // AF = exp[(0.7/8.617e-5)(1/328.15 − 1/348.15)] = exp(1.422110) = 4.14586 (hand; PHYSICS.md §6).
    assertInRelDelta(d.arrhenius!.meanFactor, 4.14586, 1e-5, 'AF');
    assertInRelDelta(d.arrhenius!.equivalentHoursPerDay, 12 * 4.14586, 1e-5, 'equivalent hours');
  });
});

describe('study site altitude', () => {
  it('raises a constant Rθsa by the laminar natural-convection factor 1/√(p/p0)', () => {
    // Steady 10 W: Tj = 25 + 10 (1.5 + 0.5 + 3 f). At 2000 m p/p0 = 0.784618 (U.S. Standard
    // Atmosphere 1976: 79,501 Pa), f = 1/√0.784618 = 1.128940 (h ∝ ρ^(1/2), PHYSICS.md §5).
    const study = singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: TA, segments: [{ durationS: 1e4, powerW: { U1: 10 } }] });
    const r = evaluateStudy(parseStudy({ ...study, site: { altitudeM: 2000 } }));
    const f = 1.12894;
    assertInRelDelta(r.site!.sinks.S1.factor, f, 1e-5, 'factor');
    assertInDelta(r.devices.U1.peakJunctionC, 25 + 10 * (2 + 3 * f), 1e-3, 'steady Tj');
    assertInDelta(r.sinks.S1.rthKPerW, 3 * f, 1e-4, 'Rθsa used');
    expect(r.site!.sinks.S1).toMatchObject({ law: 'natural', exponent: 0.25, givenRthKPerW: 3 });
  });

  it('derates a forced-air curve as Re^(1/2) and the enclosure as natural convection', () => {
    const study = twoDeviceStudy();
    study.sinks[1] = { id: 'S2', forcedAir: { airSpeedMPerS: 2, points: [{ airSpeedMPerS: 1, rthKPerW: 2 }, { airSpeedMPerS: 4, rthKPerW: 1 }] } };
    const r = evaluateStudy(parseStudy({ ...study, site: { altitudeM: 3000, radiationShare: 0.2 } }));
    const p = 0.692042; // 1976 table: 70,121 Pa at 3000 m
    const expected = 1 / (0.2 + 0.8 * Math.sqrt(p));
    assertInRelDelta(r.site!.sinks.S2.factor, expected, 1e-5, 'forced');
    assertInRelDelta(r.site!.sinks.S1.factor, expected, 1e-5, 'natural n = 1/4 (same exponent 1/2)');
    assertInRelDelta(r.site!.enclosure!.usedRthKPerW, 2 * expected, 1e-5, 'enclosure');
    expect(r.site!.sinks.S2.law).toBe('forced');
  });
});

describe('study touch check', () => {
  it('checks each sink peak against the limits set, per sink where given', () => {
    const study = twoDeviceStudy();
    const r = evaluateStudy(parseStudy({ ...study, touch: { material: 'plastic', contact: 'short', sinks: { S2: { limitC: 30 } } } }));
    const s1 = r.touch!.sinks.S1;
    // Plastic, up to 1 min: 60 °C (IEC 62368-1 touch table, from memory; see reliability/touch.ts).
    expect(s1).toMatchObject({ limitC: 60, material: 'plastic', contact: 'short', accessible: true });
    assertInDelta(s1.peakC, r.sinks.S1.peakC, 0, 'peak');
    expect(s1.passed).toBe(r.sinks.S1.peakC < 60);
    expect(r.touch!.sinks.S2.limitC).toBe(30);
    expect(r.touch!.sinks.S2.passed).toBe(r.sinks.S2.peakC < 30);
    expect(r.touch!.passed).toBe(s1.passed && r.touch!.sinks.S2.passed);
  });

  it('an inaccessible sink passes but keeps the burn caution above 60 °C (common practice)', () => {
    const study = singleRcStudy({ rjc: 1.5, rcs: 0.5, rsa: 3, c: 2, ta: TA, segments: [{ durationS: 1e4, powerW: { U1: 20 } }] });
    // Sink at 25 + 20 × 3 = 85 °C.
    const r = evaluateStudy(parseStudy({ ...study, touch: { sinks: { S1: { accessible: false } } } }));
    expect(r.touch!.sinks.S1).toMatchObject({ accessible: false, passed: true, burnCaution: true, limitC: 60 });
    const open = evaluateStudy(parseStudy({ ...study, touch: {} }));
    expect(open.touch!.sinks.S1.passed).toBe(false);
    assertInDelta(open.touch!.sinks.S1.marginK, 60 - 85, 1e-3, 'margin');
  });
});

describe('study format: site, lifetime and touch fields', () => {
  const bad: [string, (s: Record<string, any>) => void, RegExp][] = [
    ['altitude above the troposphere', (s) => (s.site = { altitudeM: 12000 }), /^site\.altitudeM: must be at most about 11,000 m/],
    ['altitude below −500 m', (s) => (s.site = { altitudeM: -800 }), /^site\.altitudeM: must be at least -500 m/],
    ['altitude missing', (s) => (s.site = {}), /^site\.altitudeM: is required/],
    ['radiation share of 1', (s) => (s.site = { altitudeM: 10, radiationShare: 1 }), /^site\.radiationShare: must be at most 0\.9/],
    ['a misspelt site field', (s) => (s.site = { altitude: 10 }), /^site\.altitude: unknown field/],
    ['no mission', (s) => (s.lifetime = {}), /^lifetime\.mission: is required/],
    ['both mission forms', (s) => (s.lifetime = { mission: { hoursPerDay: 2, repeatsPerDay: 3 } }), /^lifetime\.mission\.repeatsPerDay: give either/],
    ['cold starts on a run that is not periodic', (s) => (s.lifetime = { mission: { hoursPerDay: 2, startsPerDay: 1 } }), /^lifetime\.mission\.startsPerDay: only for a periodic profile/],
    ['more than 24 h a day', (s) => (s.lifetime = { mission: { hoursPerDay: 25 } }), /^lifetime\.mission\.hoursPerDay: must be at most 24 h/],
    ['a zero exponent', (s) => (s.lifetime = { mission: { hoursPerDay: 2 }, powerCycling: { exponent: 0 } }), /^lifetime\.powerCycling\.exponent: must be greater than zero/],
    ['Arrhenius without reference', (s) => (s.lifetime = { mission: { hoursPerDay: 2 }, arrhenius: {} }), /^lifetime\.arrhenius\.referenceC: is required/],
    ['an unknown material', (s) => (s.touch = { material: 'stone' }), /^touch\.material: must be one of metal, glass, plastic, wood/],
    ['limit and material', (s) => (s.touch = { limitC: 50, material: 'metal' }), /^touch\.material: give either limitC/],
    ['an unknown sink', (s) => (s.touch = { sinks: { S9: { limitC: 50 } } }), /^touch\.sinks\.S9: no sink has the id "S9"/],
    ['a wrong accessible type', (s) => (s.touch = { sinks: { S1: { accessible: 'no' } } }), /^touch\.sinks\.S1\.accessible: must be true or false/],
  ];
  it.each(bad)('refuses %s, naming the field', (_, change, message) => {
    const study = contractStudy();
    change(study);
    expect(() => parseStudy(study)).toThrow(message);
  });

  it('fills in the LESIT defaults (from memory) and the metal, brief-contact touch limit', () => {
    const doc = parseStudy({ ...contractStudy(), lifetime: { mission: { hoursPerDay: 8 }, arrhenius: { referenceC: 60 } }, touch: {} });
    expect(doc.lifetime!.powerCycling).toEqual({ coefficient: 640, exponent: 5, activationEnergyEV: LESIT_MODEL.activationEnergyEV });
    expect(doc.lifetime!.arrhenius).toEqual({ referenceC: 60, activationEnergyEV: 0.7 });
    expect(doc.touch!.sinks.S1).toEqual({ accessible: true, limitC: 60, material: 'metal', contact: 'brief' });
  });
});

describe('version 1 files without the new fields', () => {
  const dir = join(__dirname, '../../../examples');
  const files = readdirSync(dir).filter((f) => f.endsWith('.json'));
  const strip = (r: StudyResult) => {
    const { lifetime, touch, site, ...rest } = r;
    void lifetime;
    void touch;
    void site;
    return rest;
  };
  const without = (json: Record<string, unknown>) => {
    const { lifetime, touch, site, ...rest } = json;
    void lifetime;
    void touch;
    void site;
    return rest;
  };

  it.each(files)('%s: lifetime and touch leave every other result identical; site at sea level too', (file) => {
    const json = without(JSON.parse(readFileSync(join(dir, file), 'utf8')));
    const plain = evaluateStudy(parseStudy(json), { boundaryRows: 50 });
    expect(plain.lifetime).toBeUndefined();
    expect(plain.touch).toBeUndefined();
    expect(plain.site).toBeUndefined();
    const full = evaluateStudy(parseStudy({ ...json, lifetime: { mission: { hoursPerDay: 8 }, arrhenius: { referenceC: 50 } }, touch: {} }), { boundaryRows: 50 });
    expect(full.lifetime).toBeDefined();
    expect(strip(full)).toEqual(plain);
    const seaLevel = evaluateStudy(parseStudy({ ...json, site: { altitudeM: 0 } }), { boundaryRows: 50 });
    expect(seaLevel.site!.pressureRatio).toBe(1);
    expect(strip(seaLevel)).toEqual(plain);
  });
});

describe('docs/study-format.md site, lifetime and touch examples', () => {
  const text = readFileSync(join(__dirname, '../../../docs/study-format.md'), 'utf8');
  /** The first indented block after `marker`, as the members of one JSON object. */
  function snippet(marker: string): Record<string, any> {
    const lines = text.slice(text.indexOf(marker)).split('\n');
    const first = lines.findIndex((line) => line.startsWith('    '));
    const end = lines.findIndex((line, i) => i > first && !line.startsWith('    '));
    return JSON.parse(`{${lines.slice(first, end).join('\n')}}`);
  }

  it('parse and solve in a study', () => {
    const study = { ...twoDeviceStudy(), ...snippet('## `site`'), ...snippet('## `lifetime`'), ...snippet('## `touch`') };
    const r = evaluateStudy(parseStudy(study));
    expect(r.site!.altitudeM).toBe(2000);
    expect(r.lifetime!.mission).toEqual({ kind: 'hours', hoursPerDay: 8 });
    expect(r.touch!.sinks.S1.limitC).toBe(55);
    expect(r.touch!.sinks.S2.accessible).toBe(false);
  });
});
