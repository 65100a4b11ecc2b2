import type { ZthPoint } from '@/charts/zth-model';

import { fieldText } from './quantity-text';
import type { DeratingJson, ElectricalJson, Part, PartKind, SoaJson, ZthFit } from './types';

/** Every numeric value is kept as typed; part-input.ts reads it back. */
export type FosterRow = { rKPerW: string; tauS: string };
export type CauerRow = { rKPerW: string; capacityJPerK: string };
export type ThermalValues = { kind: 'foster' | 'cauer' | 'lumped'; terms: FosterRow[]; stages: CauerRow[]; rthKPerW: string; capacityJPerK: string };

export type DropoutRow = { currentA: string; voltageV: string };
export type LimitRow = { differentialV: string; currentA: string };
export type ElectricalValues = {
  iqA: string;
  dropout: DropoutRow[];
  currentLimit: LimitRow[];
  shutdown: boolean;
  tripC: string;
  hysteresisK: string;
  /** Fields the form does not edit, saved as they came. */
  kept: Pick<ElectricalJson, 'role' | 'adjustable'>;
};

export type SoaPointRow = { vceV: string; icA: string };
export type SoaCurveRow = { pulse: string; points: SoaPointRow[] };
export type ZthJcSource = 'none' | 'thermal' | 'stored';
export type LinearModeChoice = 'none' | 'dc-rated' | 'not-rated';
export type SoaValues = {
  kind: 'parameters' | 'points';
  tjMaxC: string;
  icMaxA: string;
  icPulseMaxA: string;
  vceoV: string;
  rthJcKPerW: string;
  secondBreakdown: boolean;
  sbVceV: string;
  sbIcA: string;
  sbExponent: string;
  /** Linear derating of second breakdown, % of the 25 °C current per K. */
  sbDeratingPctPerK: string;
  zthJc: ZthJcSource;
  linearMode: LinearModeChoice;
  longestPulse: string;
  curves: SoaCurveRow[];
  kept: {
    zthJc?: { rKPerW: number; tauS: number }[];
    sbDerating?: DeratingJson;
    sbPulses?: { pulseS: number; referenceIcA: number }[];
    secondBreakdownDerating?: DeratingJson;
    notes?: string;
  };
};

export type PartFormValues = {
  name: string;
  kind: PartKind;
  packageName: string;
  description: string;
  tjMaxC: string;
  notes: string;
  thermal: ThermalValues;
  electrical: ElectricalValues | null;
  soa: SoaValues | null;
  zthPoints: ZthPoint[] | null;
  zthFit: ZthFit | null;
};

const num = (v: number | undefined | null) => fieldText(v, 'number');

export function thermalValues(t: Part['thermal']): ThermalValues {
  return {
    kind: t.kind,
    terms: t.kind === 'foster' ? t.terms.map((x) => ({ rKPerW: num(x.rKPerW), tauS: fieldText(x.tauS, 'time') })) : [{ rKPerW: '', tauS: '' }],
    stages: t.kind === 'cauer' ? t.stages.map((x) => ({ rKPerW: num(x.rKPerW), capacityJPerK: num(x.capacityJPerK) })) : [{ rKPerW: '', capacityJPerK: '' }],
    rthKPerW: t.kind === 'lumped' ? num(t.rthKPerW) : '',
    capacityJPerK: t.kind === 'lumped' ? num(t.capacityJPerK) : '',
  };
}

export function emptyElectrical(): ElectricalValues {
  return { iqA: '', dropout: [], currentLimit: [], shutdown: false, tripC: '', hysteresisK: '', kept: {} };
}

export function electricalValues(e: ElectricalJson): ElectricalValues {
  return {
    iqA: fieldText(e.iqA, 'current'),
    dropout: (e.dropout?.points ?? []).map((p) => ({ currentA: fieldText(p.currentA, 'current'), voltageV: num(p.voltageV) })),
    currentLimit: (e.currentLimit?.points ?? []).map((p) => ({ differentialV: num(p.differentialV), currentA: fieldText(p.currentA, 'current') })),
    shutdown: Boolean(e.thermalShutdown),
    tripC: num(e.thermalShutdown?.tripC),
    hysteresisK: num(e.thermalShutdown?.hysteresisK),
    kept: { ...(e.role ? { role: e.role } : {}), ...(e.adjustable ? { adjustable: e.adjustable } : {}) },
  };
}

export function emptySoa(kind: SoaValues['kind'], tjMaxC: string): SoaValues {
  return {
    kind,
    tjMaxC,
    icMaxA: '',
    icPulseMaxA: '',
    vceoV: '',
    rthJcKPerW: '',
    secondBreakdown: false,
    sbVceV: '',
    sbIcA: '',
    sbExponent: '',
    sbDeratingPctPerK: '',
    zthJc: 'none',
    linearMode: 'none',
    longestPulse: '',
    curves: kind === 'points' ? [{ pulse: 'dc', points: [{ vceV: '', icA: '' }] }] : [],
    kept: {},
  };
}

export const curveRows = (curves: readonly { pulseS: number | 'dc'; points: readonly { vceV: number; icA: number }[] }[]): SoaCurveRow[] =>
  curves.map((c) => ({ pulse: c.pulseS === 'dc' ? 'dc' : fieldText(c.pulseS, 'time'), points: c.points.map((p) => ({ vceV: num(p.vceV), icA: num(p.icA) })) }));

const sameTerms = (a: readonly { rKPerW: number; tauS: number }[], b: readonly { rKPerW: number; tauS: number }[]) =>
  a.length === b.length && a.every((t, i) => t.rKPerW === b[i].rKPerW && t.tauS === b[i].tauS);

export function soaValues(s: SoaJson, thermal: Part['thermal']): SoaValues {
  const base = emptySoa(s.kind, num(s.tjMaxC));
  const fromThermal = s.zthJc && thermal.kind === 'foster' && sameTerms(s.zthJc, thermal.terms);
  const common: SoaValues = {
    ...base,
    zthJc: s.zthJc ? (fromThermal ? 'thermal' : 'stored') : 'none',
    linearMode: s.linearMode ? (s.linearMode.dcRated ? 'dc-rated' : 'not-rated') : 'none',
    longestPulse: fieldText(s.linearMode?.longestRatedPulseS, 'time'),
    kept: { ...(s.zthJc && !fromThermal ? { zthJc: s.zthJc } : {}), ...(s.notes ? { notes: s.notes } : {}) },
  };
  if (s.kind === 'points') {
    return { ...common, curves: curveRows(s.curves), kept: { ...common.kept, ...(s.secondBreakdownDerating ? { secondBreakdownDerating: s.secondBreakdownDerating } : {}) } };
  }
  const sb = s.secondBreakdown;
  return {
    ...common,
    icMaxA: num(s.icMaxA),
    icPulseMaxA: num(s.icPulseMaxA),
    vceoV: num(s.vceoV),
    rthJcKPerW: num(s.rthJcKPerW),
    secondBreakdown: Boolean(sb),
    sbVceV: num(sb?.referenceVceV),
    sbIcA: num(sb?.referenceIcA),
    sbExponent: num(sb?.exponent),
    // Fraction per K shown as % per K; 12 digits keep 0.4 from reading 0.39999999999999997.
    sbDeratingPctPerK: sb?.derating.kind === 'linear' ? num(Number((sb.derating.fractionPerK * 100).toPrecision(12))) : '',
    kept: { ...common.kept, ...(sb?.derating.kind === 'points' ? { sbDerating: sb.derating } : {}), ...(sb?.pulses ? { sbPulses: sb.pulses } : {}) },
  };
}

export function partValues(p: Part): PartFormValues {
  return {
    name: p.name,
    kind: p.kind,
    packageName: p.packageName,
    description: p.description,
    tjMaxC: num(p.tjMaxC),
    notes: p.notes,
    thermal: thermalValues(p.thermal),
    electrical: p.electrical ? electricalValues(p.electrical) : null,
    soa: p.soa ? soaValues(p.soa, p.thermal) : null,
    zthPoints: p.zthPoints,
    zthFit: p.zthFit,
  };
}

export function emptyPartValues(): PartFormValues {
  return {
    name: '',
    kind: 'bipolar',
    packageName: '',
    description: '',
    tjMaxC: '150',
    notes: '',
    thermal: { kind: 'foster', terms: [{ rKPerW: '', tauS: '' }], stages: [{ rKPerW: '', capacityJPerK: '' }], rthKPerW: '', capacityJPerK: '' },
    electrical: null,
    soa: null,
    zthPoints: null,
    zthFit: null,
  };
}
