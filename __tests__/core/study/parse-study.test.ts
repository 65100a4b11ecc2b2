import { parseStudy } from '@/core/study';
import { contractStudy, twoDeviceStudy } from './study-fixtures';

type Doc = Record<string, any>;

/** Applies a change to a fresh copy and returns the error parseStudy throws. */
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

describe('parseStudy accepts', () => {
  it('the contract shape exactly, with defaults filled in', () => {
    const doc = parseStudy(contractStudy());
    expect(doc.title).toBe('Contract shape');
    expect(doc.marginK).toBe(20); // common practice: 20–25 K below Tj,max
    expect(doc.devices[0]).toMatchObject({ id: 'Q1', count: 1, interfaceRthKPerW: 0.3, sink: 'S1' });
    expect(doc.sinks[0]).toMatchObject({ rthKPerW: 1.1, capacityJPerK: 180, to: 'ambient' });
    expect(doc.profile.segments[1].electrical).toEqual({ vinV: 24, voutV: 12, iloadA: 2 });
    expect(doc.profile).toMatchObject({ repeat: 1, periodic: false });
  });

  it('a sink capacity from mass and material (cp of copper 385 J/(kg·K), Incropera & DeWitt Table A.1)', () => {
    const doc = parseStudy(twoDeviceStudy());
    expect(doc.sinks[1].capacityJPerK).toBeCloseTo(0.1 * 385, 12);
    expect(doc.sinks[1].to).toBe('enclosure');
  });

  it('aluminium at cp 900 J/(kg·K) (Incropera & DeWitt Table A.1)', () => {
    const study = contractStudy();
    study.sinks[0] = { id: 'S1', rthKPerW: 1, massKg: 0.5, material: 'aluminium' };
    expect(parseStudy(study).sinks[0].capacityJPerK).toBeCloseTo(450, 12);
  });

  it('nested groups, expanded in order', () => {
    const study = contractStudy();
    study.profile.segments = [
      { repeat: 3, segments: [{ durationS: 1, powerW: { Q1: 1 } }, { repeat: 2, segments: [{ durationS: 2, powerW: {} }] }] },
    ];
    const durations = parseStudy(study).profile.segments.map((s) => s.durationS);
    expect(durations).toEqual([1, 2, 2, 1, 2, 2, 1, 2, 2]);
  });

  it('an ambient profile, natural convection with the default exponent 1/4 and a forced-air curve', () => {
    const study = twoDeviceStudy();
    study.ambient = { profile: [{ timeS: 0, temperatureC: 20 }, { timeS: 5, temperatureC: 30 }], interpolation: 'linear' };
    study.sinks[0].naturalConvection = { referenceRiseK: 50 };
    study.sinks[1] = { id: 'S2', massKg: 0.1, material: 'copper', forcedAir: { airSpeedMPerS: 2, points: [{ airSpeedMPerS: 1, rthKPerW: 2 }, { airSpeedMPerS: 4, rthKPerW: 0.5 }] } };
    const doc = parseStudy(study);
    expect(doc.ambient).toMatchObject({ kind: 'profile', interpolation: 'linear' });
    // Laminar natural convection h ∝ ΔT^(1/4) (Incropera & DeWitt, ch. 9).
    expect(doc.sinks[0].naturalConvection).toEqual({ referenceRiseK: 50, exponent: 0.25 });
    // Log-log interpolation of R = 2·v^(−1) at v = 2: 1 K/W.
    expect(doc.sinks[1].rthKPerW).toBeCloseTo(1, 12);
  });
});

// Each case: the change, the error class and the field path the message must start with.
const badCases: [string, () => Doc, (d: Doc) => void, ErrorConstructor, string][] = [
  ['another format', contractStudy, (d) => (d.format = 'other-format'), RangeError, 'format:'],
  ['a missing format', contractStudy, (d) => delete d.format, TypeError, 'format:'],
  ['version 2', contractStudy, (d) => (d.version = 2), RangeError, 'version:'],
  ['a missing version', contractStudy, (d) => delete d.version, TypeError, 'version:'],
  ['a zero Foster resistance', contractStudy, (d) => (d.devices[0].package.terms[0].rKPerW = 0), RangeError, 'devices[0].package.terms[0].rKPerW:'],
  ['a negative τ', twoDeviceStudy, (d) => (d.devices[1].package.terms[0].tauS = -0.002), RangeError, 'devices[1].package.terms[0].tauS:'],
  ['a negative interface resistance', contractStudy, (d) => (d.devices[0].interface.rthKPerW = -0.1), RangeError, 'devices[0].interface.rthKPerW:'],
  ['a zero sink resistance', contractStudy, (d) => (d.sinks[0].rthKPerW = 0), RangeError, 'sinks[0].rthKPerW:'],
  ['a zero lumped Rθjc', twoDeviceStudy, (d) => (d.devices[0].package.rthKPerW = 0), RangeError, 'devices[0].package.rthKPerW:'],
  ['a negative Cauer stage resistance', contractStudy, (d) => (d.devices[0].package = { kind: 'cauer', stages: [{ rKPerW: -1, capacityJPerK: 1 }] }), RangeError, 'devices[0].package.stages[0].rKPerW:'],
  ['a zero enclosure resistance', twoDeviceStudy, (d) => (d.enclosure.rthKPerW = 0), RangeError, 'enclosure.rthKPerW:'],
  ['a negative sink capacity', contractStudy, (d) => (d.sinks[0].capacityJPerK = -5), RangeError, 'sinks[0].capacityJPerK:'],
  ['a negative duration', contractStudy, (d) => (d.profile.segments[1].durationS = -5), RangeError, 'profile.segments[1].durationS:'],
  ['a negative duration inside a group', contractStudy, (d) => (d.profile.segments = [{ repeat: 2, segments: [{ durationS: 1 }, { durationS: -1 }] }]), RangeError, 'profile.segments[0].segments[1].durationS:'],
  ['a profile of zero length', contractStudy, (d) => (d.profile.segments = [{ durationS: 0 }]), RangeError, 'profile.segments:'],
  ['NaN in a τ', twoDeviceStudy, (d) => (d.devices[1].package.terms[1].tauS = NaN), RangeError, 'devices[1].package.terms[1].tauS:'],
  ['Infinity in a power', contractStudy, (d) => (d.profile.segments[0].powerW.Q1 = Infinity), RangeError, 'profile.segments[0].powerW.Q1:'],
  ['−Infinity in the ambient', contractStudy, (d) => (d.ambient.temperatureC = -Infinity), RangeError, 'ambient.temperatureC:'],
  ['NaN in an unknown field', contractStudy, (d) => (d.sinks[0].extra = NaN), RangeError, 'sinks[0].extra:'],
  ['a device on a missing sink', twoDeviceStudy, (d) => (d.devices[1].sink = 'S9'), RangeError, 'devices[1].sink:'],
  ['an unknown device in powerW', contractStudy, (d) => (d.profile.segments[0].powerW = { Q7: 3 }), RangeError, 'profile.segments[0].powerW.Q7:'],
  ['an unknown device in a devices list', contractStudy, (d) => (d.profile.segments[1].devices = ['Q1', 'Q8']), RangeError, 'profile.segments[1].devices[1]:'],
  ['duplicate device ids', twoDeviceStudy, (d) => (d.devices[1].id = 'Q1'), RangeError, 'devices[1].id:'],
  ['duplicate sink ids', twoDeviceStudy, (d) => (d.sinks[1].id = 'S1'), RangeError, 'sinks[1].id:'],
  ['a device id equal to a sink id', twoDeviceStudy, (d) => (d.devices[0].id = 'S2'), RangeError, 'devices[0].id:'],
  ['a reserved id', contractStudy, (d) => (d.sinks[0].id = 'ambient'), RangeError, 'sinks[0].id:'],
  ['a sink leading to itself (no path to ambient)', twoDeviceStudy, (d) => (d.sinks[0].to = 'S1'), RangeError, 'sinks[0].to:'],
  ['sinks in a loop (no path to ambient)', twoDeviceStudy, (d) => ((d.sinks[0].to = 'S2'), (d.sinks[1].to = 'S1')), RangeError, 'sinks[0].to:'],
  ['a sink leading to a missing enclosure', contractStudy, (d) => (d.sinks[0].to = 'enclosure'), RangeError, 'sinks[0].to:'],
  ['a misspelt field', contractStudy, (d) => (d.devices[0].interface = { rthKperW: 0.3 }), TypeError, 'devices[0].interface.rthKperW:'],
  ['a missing interface', contractStudy, (d) => delete d.devices[0].interface, TypeError, 'devices[0].interface:'],
  ['a resistance given as text', contractStudy, (d) => (d.sinks[0].rthKPerW = '1.1'), TypeError, 'sinks[0].rthKPerW:'],
  ['an unknown package kind', contractStudy, (d) => (d.devices[0].package.kind = 'pi'), RangeError, 'devices[0].package.kind:'],
  ['an electrical segment without iloadA', contractStudy, (d) => delete d.profile.segments[1].iloadA, TypeError, 'profile.segments[1].iloadA:'],
  ['a device both fed and given powerW', contractStudy, (d) => (d.profile.segments[1].powerW = { Q1: 1 }), RangeError, 'profile.segments[1].powerW.Q1:'],
  ['both capacity and mass', contractStudy, (d) => (d.sinks[0].massKg = 1), TypeError, 'sinks[0].massKg:'],
  ['an unknown material', contractStudy, (d) => ((d.sinks[0] = { id: 'S1', rthKPerW: 1, massKg: 1, material: 'steel' })), RangeError, 'sinks[0].material:'],
  ['an air speed outside the curve', contractStudy, (d) => ((d.sinks[0] = { id: 'S1', forcedAir: { airSpeedMPerS: 9, points: [{ airSpeedMPerS: 1, rthKPerW: 1 }, { airSpeedMPerS: 3, rthKPerW: 0.6 }] } })), RangeError, 'sinks[0].forcedAir.airSpeedMPerS:'],
  ['curve points out of order', contractStudy, (d) => (d.devices[0].electrical = { dropout: { points: [{ currentA: 1, voltageV: 1 }, { currentA: 0.5, voltageV: 0.8 }] } }), RangeError, 'devices[0].electrical.dropout.points[1].currentA:'],
  ['a zero hysteresis', contractStudy, (d) => (d.devices[0].electrical = { thermalShutdown: { tripC: 165, hysteresisK: 0 } }), RangeError, 'devices[0].electrical.thermalShutdown.hysteresisK:'],
  ['a fractional count', contractStudy, (d) => (d.devices[0].count = 1.5), RangeError, 'devices[0].count:'],
  ['ambient points out of order', contractStudy, (d) => (d.ambient = { profile: [{ timeS: 5, temperatureC: 20 }, { timeS: 5, temperatureC: 30 }] }), RangeError, 'ambient.profile[1].timeS:'],
  ['no devices', contractStudy, (d) => (d.devices = []), RangeError, 'devices:'],
  ['a document that is not an object', () => [] as unknown as Doc, () => undefined, TypeError, 'study:'],
];

describe('parseStudy refuses', () => {
  it.each(badCases)('%s, naming the field', (_name, base, change, kind, path) => {
    const error = errorOf(base, change);
    expect(error).toBeInstanceOf(kind);
    expect(error.message.startsWith(path)).toBe(true);
    // The reason follows the path.
    expect(error.message.length).toBeGreaterThan(path.length + 5);
  });

  it('a negative τ with a message that gives the value and its unit', () => {
    const error = errorOf(twoDeviceStudy, (d) => (d.devices[1].package.terms[0].tauS = -0.002));
    expect(error.message).toBe('devices[1].package.terms[0].tauS: must be greater than zero, got -0.002 s');
  });
});

describe('parseStudy mainsFed', () => {
  // docs/study-format.md, top level: `mainsFed` is true, false or absent (not stated).
  it('keeps true and false as given', () => {
    expect(parseStudy({ ...contractStudy(), mainsFed: true }).mainsFed).toBe(true);
    expect(parseStudy({ ...contractStudy(), mainsFed: false }).mainsFed).toBe(false);
  });

  it('leaves it out when the file does not state it', () => {
    expect('mainsFed' in parseStudy(contractStudy())).toBe(false);
  });

  it('refuses anything but true or false, naming the field', () => {
    const error = errorOf(contractStudy, (d) => (d.mainsFed = 'yes'));
    expect(error).toBeInstanceOf(TypeError);
    expect(error.message).toBe('mainsFed: must be true or false, got the text "yes"');
  });
});
