import { parseStudy } from '@/core/study';
import { contractStudy } from './study-fixtures';

type Doc = Record<string, any>;

const bipolarSoa = () => ({
  kind: 'parameters',
  transistor: 'bipolar',
  tjMaxC: 150,
  icMaxA: 15,
  vceoV: 100,
  rthJcKPerW: 1.2,
  zthJc: [{ rKPerW: 1.2, tauS: 0.05 }],
  secondBreakdown: { referenceVceV: 40, referenceIcA: 2, exponent: 2, derating: { kind: 'linear', fractionPerK: 0.005 } },
});

const mosfetSoa = () => ({
  kind: 'points',
  transistor: 'mosfet',
  tjMaxC: 175,
  linearMode: { dcRated: false },
  curves: [{ pulseS: 'dc', points: [{ vceV: 1, icA: 50 }, { vceV: 5, icA: 50 }, { vceV: 60, icA: 4 }] }],
});

/** The contract study with a bipolar SOA, and a rail plan study (two sources, parallel and series). */
function soaStudy(): Doc {
  const d = contractStudy();
  d.devices[0].kind = 'bipolar';
  d.devices[0].partId = 7;
  d.devices[0].soa = bipolarSoa();
  return d;
}

function railStudy(): Doc {
  const d = contractStudy();
  d.profile.segments = [{ durationS: 10, voutV: 12, iloadA: 2 }];
  d.railPlan = {
    sources: [
      { id: 'A1', vocV: 24.8, rsOhm: 0.12, imaxA: 3 },
      { id: 'A2', vocV: 24.8, rsOhm: 0.12, imaxA: 3 },
    ],
    taps: [
      { name: 'parallel', circuit: { kind: 'parallel', branches: [{ kind: 'source', source: 'A1', diodeV: 0.7, ballastOhm: 0.05 }, { kind: 'source', source: 'A2', diodeV: 0.7, ballastOhm: 0.05 }] } },
      { name: 'series', circuit: { kind: 'series', parts: [{ kind: 'source', source: 'A1' }, { kind: 'source', source: 'A2' }] } },
    ],
    thresholdsV: [20],
    hysteresisV: 0.5,
    sensed: 'output',
    relay: { breakTimeS: 0.01, inputCapacitanceF: 0.0047 },
    map: { voutMinV: 0, voutMaxV: 30, ioutMaxA: 3 },
  };
  return d;
}

function errorOf(base: () => Doc, change: (d: Doc) => void): Error {
  const doc = base();
  change(doc);
  try {
    parseStudy(doc);
  } catch (e) {
    return e as Error;
  }
  throw new Error('parseStudy accepted the document');
}

describe('parseStudy accepts the SOA, rail-plan and divider fields', () => {
  it('an SOA model as given, with the device kind and part reference', () => {
    const d = parseStudy(soaStudy()).devices[0];
    expect(d.soa).toEqual(bipolarSoa());
    expect(d).toMatchObject({ kind: 'bipolar', partId: 7 });
  });

  it('a rail plan with defaults filled in, and electrical segments without vinV', () => {
    const doc = parseStudy(railStudy());
    expect(doc.railPlan).toMatchObject({ device: 'Q1', sensed: 'output', map: { voutSteps: 61, ioutSteps: 26 } });
    expect(doc.profile.segments[0].railDrive).toEqual({ voutV: 12, iloadA: 2 });
    expect(doc.profile.segments[0].electrical).toBeUndefined();
  });

  it('a divider that sets the output of segments without voutV, Vref 1.25 V by default (common practice)', () => {
    const study = contractStudy();
    study.devices[0].electrical = { adjustable: { r1Ohm: 240, r2Ohm: 720 } };
    study.profile.segments[1] = { durationS: 5, vinV: 24, iloadA: 1 };
    const doc = parseStudy(study);
    expect(doc.devices[0].electrical!.adjustable).toEqual({ vrefV: 1.25, r1Ohm: 240, r2Ohm: 720, iadjA: 0 });
    // PHYSICS.md §1: Vref (1 + R2/R1) = 1.25 × 4 = 5 V.
    expect(doc.profile.segments[1].electrical).toEqual({ vinV: 24, voutV: 5, iloadA: 1 });
  });
});

describe.each([
  ['a negative Ic,max', soaStudy, (d: Doc) => (d.devices[0].soa.icMaxA = -1), RangeError, 'devices[0].soa.icMaxA:'],
  ['a misspelt SOA field', soaStudy, (d: Doc) => (d.devices[0].soa.icmaxA = 15), TypeError, 'devices[0].soa.icmaxA:'],
  ['an unknown SOA kind', soaStudy, (d: Doc) => (d.devices[0].soa.kind = 'table'), RangeError, 'devices[0].soa.kind:'],
  ['an unknown derating kind', soaStudy, (d: Doc) => (d.devices[0].soa.secondBreakdown.derating.kind = 'log'), RangeError, 'devices[0].soa.secondBreakdown.derating.kind:'],
  ['a second-breakdown exponent of 1', soaStudy, (d: Doc) => (d.devices[0].soa.secondBreakdown.exponent = 1), RangeError, 'devices[0].soa.secondBreakdown.exponent:'],
  ['a Zθjc term with a zero τ', soaStudy, (d: Doc) => (d.devices[0].soa.zthJc[0].tauS = 0), RangeError, 'devices[0].soa.zthJc[0].tauS:'],
  ['Zθjc that is not a list of Foster terms', soaStudy, (d: Doc) => (d.devices[0].soa.zthJc = { largestTauS: 1 }), TypeError, 'devices[0].soa.zthJc:'],
  ['SOA curve points out of order', soaStudy, (d: Doc) => {
    d.devices[0].kind = 'mosfet';
    d.devices[0].soa = mosfetSoa();
    d.devices[0].soa.curves[0].points[1].vceV = 0.5;
  }, RangeError, 'devices[0].soa.curves[0].points[1].vceV:'],
  ['a linear-mode flag that is not true or false', soaStudy, (d: Doc) => {
    d.devices[0].kind = 'mosfet';
    d.devices[0].soa = { ...mosfetSoa(), linearMode: { dcRated: 'no' } };
  }, TypeError, 'devices[0].soa.linearMode.dcRated:'],
  ['an unknown device kind', soaStudy, (d: Doc) => (d.devices[0].kind = 'triode'), RangeError, 'devices[0].kind:'],
  ['an SOA on an integrated regulator', soaStudy, (d: Doc) => (d.devices[0].kind = 'regulator'), RangeError, 'devices[0].soa:'],
  ['an SOA of another kind than the device', soaStudy, (d: Doc) => (d.devices[0].kind = 'mosfet'), RangeError, 'devices[0].soa.transistor:'],
  ['a fractional part id', soaStudy, (d: Doc) => (d.devices[0].partId = 1.5), RangeError, 'devices[0].partId:'],
  ['a zero R1', contractStudy, (d: Doc) => (d.devices[0].electrical = { adjustable: { r1Ohm: 0, r2Ohm: 720 } }), RangeError, 'devices[0].electrical.adjustable.r1Ohm:'],
  ['a misspelt divider field', contractStudy, (d: Doc) => (d.devices[0].electrical = { adjustable: { r1Ohm: 240, r2: 720 } }), TypeError, 'devices[0].electrical.adjustable.r2:'],
  ['no voutV and no divider', contractStudy, (d: Doc) => delete d.profile.segments[1].voutV, TypeError, 'profile.segments[1].voutV:'],
  ['no vinV and no rail plan', contractStudy, (d: Doc) => delete d.profile.segments[1].vinV, TypeError, 'profile.segments[1].vinV:'],
  ['a vinV where the rail plan supplies it', railStudy, (d: Doc) => (d.profile.segments[0].vinV = 24), TypeError, 'profile.segments[0].vinV:'],
  ['a zero source voltage', railStudy, (d: Doc) => (d.railPlan.sources[0].vocV = 0), RangeError, 'railPlan.sources[0].vocV:'],
  ['a duplicate source id', railStudy, (d: Doc) => (d.railPlan.sources[1].id = 'A1'), RangeError, 'railPlan.sources[1].id:'],
  ['a tap naming a missing source', railStudy, (d: Doc) => (d.railPlan.taps[1].circuit.parts[1].source = 'A9'), RangeError, 'railPlan.taps[1].circuit.parts[1].source:'],
  ['an unknown circuit kind', railStudy, (d: Doc) => (d.railPlan.taps[0].circuit.kind = 'bridge'), RangeError, 'railPlan.taps[0].circuit.kind:'],
  ['a negative ballast', railStudy, (d: Doc) => (d.railPlan.taps[0].circuit.branches[0].ballastOhm = -0.05), RangeError, 'railPlan.taps[0].circuit.branches[0].ballastOhm:'],
  ['parallel branches with no resistance to share the current', railStudy, (d: Doc) => {
    d.railPlan.sources.forEach((s: Doc) => (s.rsOhm = 0));
    d.railPlan.taps[0].circuit.branches.forEach((b: Doc) => delete b.ballastOhm);
  }, RangeError, 'railPlan.taps[0].circuit.branches[0]:'],
  ['taps out of voltage order', railStudy, (d: Doc) => d.railPlan.taps.reverse(), RangeError, 'railPlan.taps[1]:'],
  ['too many thresholds', railStudy, (d: Doc) => (d.railPlan.thresholdsV = [10, 20]), RangeError, 'railPlan.thresholdsV:'],
  ['an unknown sensed voltage', railStudy, (d: Doc) => (d.railPlan.sensed = 'input'), RangeError, 'railPlan.sensed:'],
  ['a negative hysteresis', railStudy, (d: Doc) => (d.railPlan.hysteresisV = -0.1), RangeError, 'railPlan.hysteresisV:'],
  ['a device the plan cannot feed', railStudy, (d: Doc) => (d.railPlan.device = 'Q9'), RangeError, 'railPlan.device:'],
  ['a map range upside down', railStudy, (d: Doc) => (d.railPlan.map.voutMaxV = 0), RangeError, 'railPlan.map.voutMaxV:'],
  ['a map grid too fine', railStudy, (d: Doc) => (d.railPlan.map.voutSteps = 1000), RangeError, 'railPlan.map.voutSteps:'],
  ['a missing map', railStudy, (d: Doc) => delete d.railPlan.map, TypeError, 'railPlan.map:'],
  ['a zero input capacitance', railStudy, (d: Doc) => (d.railPlan.relay.inputCapacitanceF = 0), RangeError, 'railPlan.relay.inputCapacitanceF:'],
  ['a misspelt rail-plan field', railStudy, (d: Doc) => (d.railPlan.threshold = [20]), TypeError, 'railPlan.threshold:'],
])('parseStudy refuses %s', (_name, base, change, type, path) => {
  it(`with a ${type.name} naming ${path}`, () => {
    const e = errorOf(base, change);
    expect(e).toBeInstanceOf(type);
    expect(e.message.startsWith(path)).toBe(true);
  });
});

it('parseStudy asks which device a rail plan feeds when several are pass devices', () => {
  const e = errorOf(railStudy, (d) => d.devices.push({ ...d.devices[0], id: 'Q2' }));
  expect(e).toBeInstanceOf(TypeError);
  expect(e.message).toMatch(/^railPlan\.device: is required when several devices/);
});
