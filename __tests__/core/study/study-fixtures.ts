/** Study documents for tests, built fresh on each call so a test may change its copy. */

/** The minimal shape the study format must accept, as written in its contract. */
export function contractStudy(): Record<string, any> {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Contract shape',
    ambient: { temperatureC: 40 },
    sinks: [{ id: 'S1', rthKPerW: 1.1, capacityJPerK: 180 }],
    devices: [
      {
        id: 'Q1',
        tjMaxC: 150,
        sink: 'S1',
        package: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: 0.001 }] },
        interface: { rthKPerW: 0.3 },
      },
    ],
    profile: {
      segments: [
        { durationS: 10, powerW: { Q1: 20 } },
        { durationS: 5, vinV: 24, voutV: 12, iloadA: 2 },
      ],
      repeat: 1,
    },
  };
}

/** Two devices on two sinks with an enclosure: room for every reference the validator checks. */
export function twoDeviceStudy(): Record<string, any> {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Two devices',
    ambient: { temperatureC: 25 },
    enclosure: { rthKPerW: 2, capacityJPerK: 50 },
    sinks: [
      { id: 'S1', rthKPerW: 1, capacityJPerK: 100 },
      { id: 'S2', rthKPerW: 2, massKg: 0.1, material: 'copper' },
    ],
    devices: [
      { id: 'Q1', tjMaxC: 150, sink: 'S1', package: { kind: 'lumped', rthKPerW: 0.5, capacityJPerK: 1 }, interface: { rthKPerW: 0.2 } },
      {
        id: 'Q2',
        tjMaxC: 175,
        sink: 'S2',
        package: { kind: 'foster', terms: [{ rKPerW: 0.1, tauS: 0.001 }, { rKPerW: 0.3, tauS: 0.02 }] },
        interface: { rthKPerW: 0.3 },
      },
    ],
    profile: { segments: [{ durationS: 10, powerW: { Q1: 5, Q2: 3 } }] },
  };
}

/**
 * One lumped device on a massless sink: a single RC with R = Rjc + Rcs + Rsa and C at the
 * junction (the case and sink nodes carry no capacity and are condensed away).
 */
export function singleRcStudy(o: { rjc: number; rcs: number; rsa: number; c: number; ta: number; segments: object[]; electrical?: object }): Record<string, any> {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Single RC',
    ambient: { temperatureC: o.ta },
    sinks: [{ id: 'S1', rthKPerW: o.rsa }],
    devices: [
      {
        id: 'U1',
        tjMaxC: 150,
        sink: 'S1',
        package: { kind: 'lumped', rthKPerW: o.rjc, capacityJPerK: o.c },
        interface: { rthKPerW: o.rcs },
        ...(o.electrical ? { electrical: o.electrical } : {}),
      },
    ],
    profile: { segments: o.segments },
  };
}
