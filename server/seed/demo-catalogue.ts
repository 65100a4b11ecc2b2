import type { Transaction } from 'sequelize';
import type { Db } from '../db';

/**
 * An invented demo catalogue (demo data): about forty sinks from small clip-ons to large
 * extrusions. Values are made up but plausible in the usual way: still-air Rθsa at a 75 K
 * rise falls roughly with envelope volume to the 0.65 power, the aluminium fills about a
 * third of the envelope, and forced air lowers Rθsa by half at 1 m/s.
 */
type Family = { prefix: string; kind: string; widthMm: number; heightMm: number; lengths: number[]; fill: number; devices: number; forced: boolean };

const FAMILIES: Family[] = [
  { prefix: 'CL', kind: 'clip-on for TO-220', widthMm: 14, heightMm: 10, lengths: [13, 19, 25, 32], fill: 0.35, devices: 1, forced: false },
  { prefix: 'ST', kind: 'stamped vertical board sink', widthMm: 25, heightMm: 13, lengths: [13, 19, 25, 38, 50], fill: 0.2, devices: 1, forced: false },
  { prefix: 'BX', kind: 'board-mount extrusion', widthMm: 42, heightMm: 25, lengths: [25, 38, 50, 63, 75, 100], fill: 0.32, devices: 2, forced: true },
  { prefix: 'PX', kind: 'flat-back extrusion', widthMm: 75, heightMm: 32, lengths: [50, 75, 100, 125, 150, 200], fill: 0.3, devices: 2, forced: true },
  { prefix: 'WX', kind: 'wide fin extrusion', widthMm: 120, heightMm: 40, lengths: [50, 75, 100, 150, 200, 250, 300], fill: 0.28, devices: 4, forced: true },
  { prefix: 'HX', kind: 'heavy extrusion', widthMm: 200, heightMm: 65, lengths: [100, 150, 200, 250, 300, 400], fill: 0.27, devices: 6, forced: true },
  { prefix: 'TN', kind: 'tunnel extrusion for fans', widthMm: 60, heightMm: 60, lengths: [50, 75, 100, 150, 200, 250], fill: 0.3, devices: 4, forced: true },
];

const round = (x: number, digits = 2) => Number(x.toPrecision(digits));

export function demoHeatsinks() {
  return FAMILIES.flatMap((f) =>
    f.lengths.map((lengthMm) => {
      const envelopeCm3 = (f.widthMm * f.heightMm * lengthMm) / 1000;
      const rthKPerW = round(60 / envelopeCm3 ** 0.65);
      const massKg = round((envelopeCm3 * f.fill * 2.7) / 1000, 3);
      return {
        name: `${f.prefix}-${f.widthMm}-${lengthMm} (demo)`,
        description: `Demo data: invented ${f.kind}, ${f.widthMm} × ${lengthMm} × ${f.heightMm} mm.`,
        rthKPerW,
        referenceRiseK: 75,
        forcedAir: f.forced
          ? [
              { airSpeedMPerS: 1, rthKPerW: round(rthKPerW * 0.52) },
              { airSpeedMPerS: 2, rthKPerW: round(rthKPerW * 0.38) },
              { airSpeedMPerS: 4, rthKPerW: round(rthKPerW * 0.27) },
            ]
          : [],
        massKg,
        material: 'aluminium' as const,
        capacityJPerK: null,
        widthMm: f.widthMm,
        lengthMm,
        heightMm: f.heightMm,
        devicesPerSink: f.devices,
        price: round(0.4 + massKg * 18, 3),
        notes: 'Demo data.',
        isDemo: true,
      };
    }),
  );
}

export function demoInterfaceMaterials() {
  const base = { notes: 'Demo data: invented typical values.', isDemo: true, conductivityWPerMK: null, thicknessMm: null, contactKCm2PerW: null };
  return [
    { ...base, name: 'Greased mica washer, TO-220 (demo)', kind: 'per_package' as const, packageName: 'TO-220', rthKPerW: 1.2 },
    { ...base, name: 'Silicone pad, TO-220 (demo)', kind: 'per_package' as const, packageName: 'TO-220', rthKPerW: 1.8 },
    { ...base, name: 'Thermal grease, TO-247 (demo)', kind: 'per_package' as const, packageName: 'TO-247', rthKPerW: 0.25 },
    { ...base, name: 'Silicone pad, TO-247 (demo)', kind: 'per_package' as const, packageName: 'TO-247', rthKPerW: 0.6 },
    { ...base, name: 'Greased mica, TO-3 (demo)', kind: 'per_package' as const, packageName: 'TO-3', rthKPerW: 0.4 },
    { ...base, name: 'Bare metal contact, TO-220 (demo)', kind: 'per_package' as const, packageName: 'TO-220', rthKPerW: 0.9 },
    { ...base, name: 'Gap filler 1.5 W/m·K, 0.25 mm (demo)', kind: 'per_area' as const, packageName: null, rthKPerW: null, conductivityWPerMK: 1.5, thicknessMm: 0.25, contactKCm2PerW: 0.1 },
    { ...base, name: 'Phase-change film 3 W/m·K, 0.1 mm (demo)', kind: 'per_area' as const, packageName: null, rthKPerW: null, conductivityWPerMK: 3, thicknessMm: 0.1, contactKCm2PerW: 0.05 },
  ];
}

export async function seedDemoCatalogue(db: Db, teamId: number, transaction: Transaction) {
  await db.models.Heatsink.bulkCreate(demoHeatsinks().map((h) => ({ ...h, teamId })), { transaction });
  await db.models.InterfaceMaterial.bulkCreate(demoInterfaceMaterials().map((m) => ({ ...m, teamId })), { transaction });
}
