import type { ThermalModel, ZthPoint } from '@/charts/zth-model';
import type { PulseWidth } from '@/core/soa';

export type PartKind = 'regulator' | 'bipolar' | 'darlington' | 'mosfet';
export type TransistorKind = Exclude<PartKind, 'regulator'>;

/** A study device's `electrical` block as JSON (docs/study-format.md); role and divider kept as given. */
export type ElectricalJson = {
  role?: 'pass' | 'other';
  iqA?: number;
  dropout?: { points: { currentA: number; voltageV: number }[] };
  currentLimit?: { points: { differentialV: number; currentA: number }[] };
  thermalShutdown?: { tripC: number; hysteresisK: number };
  adjustable?: { r1Ohm: number; r2Ohm: number; vrefV?: number; iadjA?: number };
};

export type DeratingJson = { kind: 'linear'; fractionPerK: number } | { kind: 'points'; points: { caseC: number; factor: number }[] };

type SoaCommonJson = {
  transistor: TransistorKind;
  tjMaxC: number;
  zthJc?: { rKPerW: number; tauS: number }[];
  linearMode?: { dcRated: boolean; longestRatedPulseS?: number };
  notes?: string;
};

export type SoaCurveJson = { pulseS: PulseWidth; points: { vceV: number; icA: number }[] };

/** A part's SOA model as JSON: the SOA core's model (src/core/soa/types.ts). */
export type SoaJson =
  | (SoaCommonJson & {
      kind: 'parameters';
      icMaxA: number;
      icPulseMaxA?: number;
      vceoV: number;
      rthJcKPerW: number;
      secondBreakdown?: {
        referenceVceV: number;
        referenceIcA: number;
        exponent: number;
        derating: DeratingJson;
        pulses?: { pulseS: number; referenceIcA: number }[];
      };
    })
  | (SoaCommonJson & { kind: 'points'; curves: SoaCurveJson[]; secondBreakdownDerating?: DeratingJson });

/** What `POST /api/parts/zth-fit` answers: the points read and the Foster set fitted to them. */
export type ZthFit = {
  terms: { rKPerW: number; tauS: number }[];
  rmsRelativeError: number;
  maxRelativeError: number;
  maxErrorTimeS: number;
  warning?: string;
  grid: { tauMinS: number; tauMaxS: number; perDecade: number };
};
export type ZthFitResponse = { points: ZthPoint[]; fit: ZthFit };

/** One row of `GET /api/parts`. */
export type Part = {
  id: number;
  teamId: number;
  name: string;
  kind: PartKind;
  packageName: string;
  description: string;
  tjMaxC: number;
  thermal: ThermalModel;
  electrical: ElectricalJson | null;
  soa: SoaJson | null;
  zthPoints: ZthPoint[] | null;
  zthFit: ZthFit | null;
  notes: string;
  isDemo: boolean;
  updatedAt: string;
};
