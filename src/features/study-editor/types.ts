/**
 * The study document as the editor holds it: the JSON of docs/study-format.md, loosely
 * typed, with fields the editor does not know kept as they are. A numeric field may hold
 * the text being typed while it does not read as a number yet.
 */
export type Num = number | string;

export type RawObject = Record<string, unknown>;

export type RawSegment = {
  durationS?: Num;
  label?: string;
  powerW?: Record<string, Num>;
  vinV?: Num;
  voutV?: Num;
  iloadA?: Num;
  devices?: string[];
};

export type RawGroup = { repeat?: Num; segments?: RawItem[]; label?: string };

export type RawItem = RawSegment | RawGroup;

export type RawProfile = { segments?: RawItem[]; repeat?: Num; periodic?: boolean };

export type RawPoint = Record<string, Num>;

export type RawDevice = RawObject & {
  id?: string;
  name?: string;
  tjMaxC?: Num;
  sink?: string;
  count?: Num;
  package?: RawObject & { kind?: string; terms?: RawPoint[]; stages?: RawPoint[]; rthKPerW?: Num; capacityJPerK?: Num };
  interface?: RawObject & { rthKPerW?: Num; material?: string };
  electrical?: RawObject;
  kind?: string;
  partId?: number;
  soa?: RawObject;
};

export type RawSink = RawObject & {
  id?: string;
  name?: string;
  rthKPerW?: Num;
  capacityJPerK?: Num;
  massKg?: Num;
  material?: string;
  to?: string;
  naturalConvection?: { referenceRiseK?: Num; exponent?: Num };
  forcedAir?: { airSpeedMPerS?: Num; points?: RawPoint[] };
};

export type RawAmbient = { temperatureC?: Num; profile?: RawPoint[]; interpolation?: string };

export type RawDocument = RawObject & {
  format?: string;
  version?: number;
  title?: string;
  description?: string;
  mainsFed?: boolean;
  marginK?: Num;
  ambient?: RawAmbient;
  enclosure?: RawObject & { rthKPerW?: Num; capacityJPerK?: Num };
  sinks?: RawSink[];
  devices?: RawDevice[];
  profile?: RawProfile;
  railPlan?: RawObject;
};

/** What the form edits: the study's title and description, and its document. */
export type EditorValues = { title: string; description: string; document: RawDocument };

export const isGroup = (item: RawItem): item is RawGroup => 'segments' in item || 'repeat' in item;

/** An electrical operating point (Vin, Vout, Iload) rather than power per device. */
export const isElectrical = (segment: RawSegment): boolean =>
  segment.vinV !== undefined || segment.voutV !== undefined || segment.iloadA !== undefined;
