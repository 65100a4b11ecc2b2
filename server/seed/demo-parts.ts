import type { Transaction } from 'sequelize';
import type { Db } from '../db';

const demo = 'Demo data: an invented part with plausible datasheet-like values. Not a real product.';

/** Invented parts for the demo team (demo data), written as the study format's device models. */
export function demoParts() {
  return [
    {
      name: 'LR-505 fixed 5 V regulator (demo)',
      kind: 'regulator' as const,
      packageName: 'D2PAK-like power package',
      description: demo,
      tjMaxC: 150,
      thermal: { kind: 'foster', terms: [{ rKPerW: 0.25, tauS: 0.0008 }, { rKPerW: 0.75, tauS: 0.015 }, { rKPerW: 1.0, tauS: 0.25 }] },
      electrical: {
        iqA: 0.005,
        dropout: { points: [{ currentA: 0, voltageV: 0.9 }, { currentA: 0.5, voltageV: 1.3 }, { currentA: 1.5, voltageV: 1.9 }] },
        currentLimit: { points: [{ differentialV: 0, currentA: 2.0 }, { differentialV: 12, currentA: 1.6 }, { differentialV: 30, currentA: 0.5 }] },
        thermalShutdown: { tripC: 165, hysteresisK: 15 },
      },
      soa: null,
    },
    {
      name: 'LR-317A adjustable regulator (demo)',
      kind: 'regulator' as const,
      packageName: 'TO-220',
      description: `${demo} Vref 1.25 V, adjust current 50 µA.`,
      tjMaxC: 125,
      thermal: { kind: 'foster', terms: [{ rKPerW: 0.3, tauS: 0.001 }, { rKPerW: 1.2, tauS: 0.02 }, { rKPerW: 1.5, tauS: 0.4 }] },
      electrical: {
        iqA: 0.005,
        dropout: { points: [{ currentA: 0, voltageV: 1.6 }, { currentA: 1.5, voltageV: 2.2 }] },
        currentLimit: { points: [{ differentialV: 0, currentA: 2.2 }, { differentialV: 15, currentA: 1.5 }, { differentialV: 40, currentA: 0.4 }] },
        thermalShutdown: { tripC: 160, hysteresisK: 10 },
      },
      soa: null,
    },
    {
      name: 'QN-150 NPN power transistor (demo)',
      kind: 'bipolar' as const,
      packageName: 'TO-247',
      description: demo,
      tjMaxC: 150,
      thermal: { kind: 'foster', terms: [{ rKPerW: 0.05, tauS: 0.0002 }, { rKPerW: 0.15, tauS: 0.003 }, { rKPerW: 0.3, tauS: 0.04 }, { rKPerW: 0.33, tauS: 0.5 }] },
      electrical: { iqA: 0.02 },
      soa: {
        kind: 'parameters',
        transistor: 'bipolar',
        tjMaxC: 150,
        icMaxA: 15,
        icPulseMaxA: 25,
        vceoV: 140,
        rthJcKPerW: 0.83,
        zthJc: [{ rKPerW: 0.05, tauS: 0.0002 }, { rKPerW: 0.15, tauS: 0.003 }, { rKPerW: 0.3, tauS: 0.04 }, { rKPerW: 0.33, tauS: 0.5 }],
        secondBreakdown: { referenceVceV: 50, referenceIcA: 2.4, exponent: 2.2, derating: { kind: 'linear', fractionPerK: 0.004 } },
      },
    },
    {
      name: 'QD-80 NPN Darlington (demo)',
      kind: 'darlington' as const,
      packageName: 'TO-3P-like',
      description: demo,
      tjMaxC: 150,
      thermal: { kind: 'lumped', rthKPerW: 1.0, capacityJPerK: 0.8 },
      electrical: { iqA: 0.002 },
      soa: {
        kind: 'parameters',
        transistor: 'darlington',
        tjMaxC: 150,
        icMaxA: 10,
        vceoV: 100,
        rthJcKPerW: 1.0,
        secondBreakdown: { referenceVceV: 40, referenceIcA: 2.0, exponent: 1.8, derating: { kind: 'linear', fractionPerK: 0.005 } },
      },
    },
    {
      name: 'MN-60 N-channel MOSFET, switching type (demo)',
      kind: 'mosfet' as const,
      packageName: 'TO-247',
      description: `${demo} Its DC SOA is not rated for linear mode.`,
      tjMaxC: 175,
      thermal: { kind: 'foster', terms: [{ rKPerW: 0.04, tauS: 0.0001 }, { rKPerW: 0.12, tauS: 0.002 }, { rKPerW: 0.2, tauS: 0.03 }, { rKPerW: 0.14, tauS: 0.3 }] },
      electrical: { iqA: 0 },
      soa: {
        kind: 'points',
        transistor: 'mosfet',
        tjMaxC: 175,
        linearMode: { dcRated: false, longestRatedPulseS: 0.01 },
        curves: [
          { pulseS: 0.001, points: [{ vceV: 1, icA: 80 }, { vceV: 10, icA: 40 }, { vceV: 60, icA: 4 }] },
          { pulseS: 0.01, points: [{ vceV: 1, icA: 80 }, { vceV: 5, icA: 40 }, { vceV: 60, icA: 1.6 }] },
          { pulseS: 'dc', points: [{ vceV: 1, icA: 60 }, { vceV: 5, icA: 20 }, { vceV: 60, icA: 0.5 }] },
        ],
      },
    },
    {
      name: 'ML-100 N-channel MOSFET for linear mode (demo)',
      kind: 'mosfet' as const,
      packageName: 'TO-247',
      description: `${demo} Rated for DC linear operation.`,
      tjMaxC: 150,
      thermal: { kind: 'foster', terms: [{ rKPerW: 0.03, tauS: 0.0002 }, { rKPerW: 0.1, tauS: 0.004 }, { rKPerW: 0.17, tauS: 0.05 }, { rKPerW: 0.15, tauS: 0.6 }] },
      electrical: { iqA: 0 },
      soa: {
        kind: 'points',
        transistor: 'mosfet',
        tjMaxC: 150,
        linearMode: { dcRated: true },
        curves: [{ pulseS: 'dc', points: [{ vceV: 1, icA: 50 }, { vceV: 6, icA: 46 }, { vceV: 100, icA: 2.7 }] }],
      },
    },
  ];
}

export async function seedDemoParts(db: Db, teamId: number, transaction: Transaction) {
  await db.models.Part.bulkCreate(
    demoParts().map((p) => ({ ...p, teamId, isDemo: true, notes: 'Demo data.', zthPoints: null, zthFit: null })),
    { transaction },
  );
}
