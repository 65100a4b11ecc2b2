import type { Study } from '@/features/studies/types';

import { PEOPLE } from './teamwork-fixtures';

/** The "Full example" of the study format reference (docs/study-format.md), invented values. */
export function fullExample() {
  return {
    format: 'junctura-study',
    version: 1,
    title: 'Pass transistor on a small sink (demo data)',
    description: 'Demo data: invented values.',
    marginK: 20,
    ambient: { temperatureC: 40 },
    enclosure: { rthKPerW: 2.5, capacityJPerK: 150 },
    sinks: [{ id: 'S1', rthKPerW: 1.1, massKg: 0.2, material: 'aluminium', naturalConvection: { referenceRiseK: 50, exponent: 0.25 } }],
    devices: [
      {
        id: 'Q1',
        name: 'pass transistor',
        tjMaxC: 150,
        sink: 'S1',
        count: 1,
        package: { kind: 'foster', terms: [{ rKPerW: 0.2, tauS: 0.001 }, { rKPerW: 0.5, tauS: 0.05 }] },
        interface: { rthKPerW: 0.3, material: 'silicone pad' },
        electrical: {
          iqA: 0.005,
          dropout: { points: [{ currentA: 0, voltageV: 0.8 }, { currentA: 3, voltageV: 1.6 }] },
          currentLimit: { points: [{ differentialV: 2, currentA: 3.5 }, { differentialV: 20, currentA: 1.5 }] },
          thermalShutdown: { tripC: 165, hysteresisK: 15 },
        },
      },
    ],
    profile: {
      segments: [
        { label: 'warm-up', durationS: 10, powerW: { Q1: 20 } },
        { label: 'load', durationS: 5, vinV: 24, voutV: 12, iloadA: 2 },
        {
          label: 'pulses',
          repeat: 10,
          segments: [
            { durationS: 0.5, vinV: 24, voutV: 12, iloadA: 3 },
            { durationS: 1.5, vinV: 24, voutV: 12, iloadA: 0.2 },
          ],
        },
      ],
      repeat: 2,
      periodic: false,
    },
  };
}

/** Study 21 by the designer, at `version`, holding the full example. */
export function editableStudy(version = 3, overrides: Partial<Study> = {}): Study {
  return {
    id: 21,
    teamId: 1,
    teamName: 'Test Lab',
    title: 'Pass transistor on a small sink (demo data)',
    description: 'Demo data: invented values.',
    status: 'draft',
    version,
    author: { id: PEOPLE.designer.id, name: PEOPLE.designer.name },
    createdAt: '2025-05-01T09:00:00.000Z',
    updatedAt: '2025-05-03T09:00:00.000Z',
    document: fullExample(),
    approval: null,
    ...overrides,
  };
}
