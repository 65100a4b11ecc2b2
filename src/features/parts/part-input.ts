import { zthEquivalent, type ThermalModel } from '@/charts/zth-model';

import type { ElectricalValues, PartFormValues, SoaValues, ThermalValues } from './part-form-values';
import { readField, type FieldKind } from './quantity-text';

/** Problems of text that does not read as a number, keyed by the field's API path. */
export type Problems = Record<string, string>;

type Reader = (text: string, kind: FieldKind, path: string) => number | undefined;

function reader(problems: Problems): Reader {
  return (text, kind, path) => {
    if (text.trim() === '') return undefined;
    const read = readField(text, kind);
    if (read.ok) return read.value;
    problems[path] = read.reason.startsWith('"') ? read.reason : `Value ${read.reason}`;
    return undefined;
  };
}

/** Drops keys whose value is undefined, so an empty optional field is simply absent. */
const defined = <T extends Record<string, unknown>>(o: T): T => Object.fromEntries(Object.entries(o).filter(([, v]) => v !== undefined)) as T;

export function thermalInput(t: ThermalValues, read: Reader): Record<string, unknown> {
  if (t.kind === 'foster') {
    return { kind: 'foster', terms: t.terms.map((r, i) => defined({ rKPerW: read(r.rKPerW, 'thermalResistance', `thermal.terms[${i}].rKPerW`), tauS: read(r.tauS, 'time', `thermal.terms[${i}].tauS`) })) };
  }
  if (t.kind === 'cauer') {
    return {
      kind: 'cauer',
      stages: t.stages.map((r, i) =>
        defined({ rKPerW: read(r.rKPerW, 'thermalResistance', `thermal.stages[${i}].rKPerW`), capacityJPerK: read(r.capacityJPerK, 'heatCapacity', `thermal.stages[${i}].capacityJPerK`) }),
      ),
    };
  }
  return defined({ kind: 'lumped', rthKPerW: read(t.rthKPerW, 'thermalResistance', 'thermal.rthKPerW'), capacityJPerK: read(t.capacityJPerK, 'heatCapacity', 'thermal.capacityJPerK') });
}

/** The thermal model as numbers when every value reads and is positive, else null. */
export function readThermal(t: ThermalValues): ThermalModel | null {
  const problems: Problems = {};
  const m = thermalInput(t, reader(problems)) as ThermalModel;
  if (Object.keys(problems).length) return null;
  const ok = (v: unknown, zeroOk = false) => typeof v === 'number' && Number.isFinite(v) && (zeroOk ? v >= 0 : v > 0);
  if (m.kind === 'foster') return m.terms.length && m.terms.every((x) => ok(x.rKPerW) && ok(x.tauS)) ? m : null;
  if (m.kind === 'cauer') return m.stages.length && m.stages.every((x) => ok(x.rKPerW) && ok(x.capacityJPerK, true)) ? m : null;
  return ok(m.rthKPerW) && (m.capacityJPerK === undefined || ok(m.capacityJPerK, true)) ? m : null;
}

function electricalInput(e: ElectricalValues, read: Reader): Record<string, unknown> {
  return defined({
    ...e.kept,
    iqA: read(e.iqA, 'current', 'electrical.iqA'),
    dropout: e.dropout.length
      ? { points: e.dropout.map((p, i) => defined({ currentA: read(p.currentA, 'current', `electrical.dropout.points[${i}].currentA`), voltageV: read(p.voltageV, 'voltage', `electrical.dropout.points[${i}].voltageV`) })) }
      : undefined,
    currentLimit: e.currentLimit.length
      ? {
          points: e.currentLimit.map((p, i) =>
            defined({ differentialV: read(p.differentialV, 'voltage', `electrical.currentLimit.points[${i}].differentialV`), currentA: read(p.currentA, 'current', `electrical.currentLimit.points[${i}].currentA`) }),
          ),
        }
      : undefined,
    thermalShutdown: e.shutdown
      ? defined({ tripC: read(e.tripC, 'temperature', 'electrical.thermalShutdown.tripC'), hysteresisK: read(e.hysteresisK, 'temperatureDifference', 'electrical.thermalShutdown.hysteresisK') })
      : undefined,
  });
}

/** Zθjc for pulses: the thermal model's step response as Foster terms (the case held fixed). */
export function zthJcFromThermal(t: ThermalValues): { rKPerW: number; tauS: number }[] | null {
  const model = readThermal(t);
  if (!model) return null;
  try {
    const eq = zthEquivalent(model);
    return eq.instantKPerW > 0 || eq.terms.length === 0 ? null : eq.terms.map((x) => ({ rKPerW: x.rKPerW, tauS: x.tauS }));
  } catch {
    return null;
  }
}

function soaInput(s: SoaValues, v: PartFormValues, read: Reader, problems: Problems): Record<string, unknown> {
  let zthJc: { rKPerW: number; tauS: number }[] | undefined;
  if (s.zthJc === 'stored') zthJc = s.kept.zthJc;
  if (s.zthJc === 'thermal') {
    zthJc = zthJcFromThermal(v.thermal) ?? undefined;
    if (!zthJc) problems['soa.zthJc'] = 'Zθjc comes from the thermal model, which needs valid values and a heat capacity at every stage';
  }
  const transistor = v.kind === 'regulator' ? undefined : v.kind;
  const common = defined({
    kind: s.kind,
    transistor,
    tjMaxC: read(s.tjMaxC, 'temperature', 'soa.tjMaxC'),
    zthJc,
    linearMode:
      v.kind === 'mosfet' && s.linearMode !== 'none'
        ? defined({ dcRated: s.linearMode === 'dc-rated', longestRatedPulseS: s.linearMode === 'not-rated' ? read(s.longestPulse, 'time', 'soa.linearMode.longestRatedPulseS') : undefined })
        : undefined,
    notes: s.kept.notes,
  });
  if (s.kind === 'points') {
    return defined({
      ...common,
      curves: s.curves.map((c, i) => {
        const dc = c.pulse.trim().toLowerCase() === 'dc';
        return {
          pulseS: dc ? 'dc' : read(c.pulse, 'time', `soa.curves[${i}].pulseS`),
          points: c.points.map((p, j) => defined({ vceV: read(p.vceV, 'voltage', `soa.curves[${i}].points[${j}].vceV`), icA: read(p.icA, 'current', `soa.curves[${i}].points[${j}].icA`) })),
        };
      }),
      secondBreakdownDerating: s.kept.secondBreakdownDerating,
    });
  }
  const pct = read(s.sbDeratingPctPerK, 'number', 'soa.secondBreakdown.derating');
  return defined({
    ...common,
    icMaxA: read(s.icMaxA, 'current', 'soa.icMaxA'),
    icPulseMaxA: read(s.icPulseMaxA, 'current', 'soa.icPulseMaxA'),
    vceoV: read(s.vceoV, 'voltage', 'soa.vceoV'),
    rthJcKPerW: read(s.rthJcKPerW, 'thermalResistance', 'soa.rthJcKPerW'),
    secondBreakdown: s.secondBreakdown
      ? defined({
          referenceVceV: read(s.sbVceV, 'voltage', 'soa.secondBreakdown.referenceVceV'),
          referenceIcA: read(s.sbIcA, 'current', 'soa.secondBreakdown.referenceIcA'),
          exponent: read(s.sbExponent, 'number', 'soa.secondBreakdown.exponent'),
          derating: s.kept.sbDerating ?? (pct === undefined ? undefined : { kind: 'linear', fractionPerK: pct / 100 }),
          pulses: s.kept.sbPulses,
        })
      : undefined,
  });
}

/**
 * The API body of the form (the shared part schema's fields) and the fields whose text does
 * not read as a number. A regulator is saved without an SOA model.
 */
export function partInput(v: PartFormValues): { input: Record<string, unknown>; problems: Problems } {
  const problems: Problems = {};
  const read = reader(problems);
  const input = {
    name: v.name,
    kind: v.kind,
    packageName: v.packageName,
    description: v.description,
    tjMaxC: read(v.tjMaxC, 'temperature', 'tjMaxC'),
    thermal: thermalInput(v.thermal, read),
    electrical: v.electrical ? electricalInput(v.electrical, read) : null,
    soa: v.soa && v.kind !== 'regulator' ? soaInput(v.soa, v, read, problems) : null,
    zthPoints: v.zthPoints,
    zthFit: v.zthFit,
    notes: v.notes,
  };
  return { input, problems };
}

/** The SOA model as the form would save it, when every value reads; null otherwise. */
export function readSoa(v: PartFormValues): Record<string, unknown> | null {
  if (!v.soa || v.kind === 'regulator') return null;
  const problems: Problems = {};
  const soa = soaInput(v.soa, v, reader(problems), problems);
  return Object.keys(problems).length ? null : soa;
}
