import type { RawDocument, RawObject } from './types';

/** A tap's circuit as the editor holds it (docs/study-format.md, `railPlan.taps[].circuit`). */
export type RawCircuit = RawObject & { kind?: string; source?: string; parts?: RawCircuit[]; branches?: RawCircuit[] };

export type RawRailPlan = RawObject & {
  device?: string;
  sources?: (RawObject & { id?: string })[];
  taps?: (RawObject & { name?: string; circuit?: RawCircuit })[];
  thresholdsV?: unknown[];
  hysteresisV?: unknown;
  sensed?: string;
  relay?: RawObject;
  map?: RawObject;
};

/**
 * A first plan for the document: one source feeding one tap, the map over 0 V to the highest
 * output the profile asks for. Values the designer must know are left empty so the problem
 * list asks for them (nothing is made up).
 */
export function starterRailPlan(doc: RawDocument): RawRailPlan {
  const vouts = (doc.profile?.segments ?? []).flatMap((s) => ('voutV' in s && typeof s.voutV === 'number' ? [s.voutV] : []));
  return {
    sources: [{ id: 'A1', vocV: '', rsOhm: '', imaxA: '' }],
    taps: [{ name: 'tap 1', circuit: { kind: 'source', source: 'A1' } }],
    thresholdsV: [],
    hysteresisV: '',
    sensed: 'output',
    map: { voutMinV: 0, voutMaxV: vouts.length > 0 ? Math.max(...vouts) : '', ioutMaxA: '' },
  };
}

/** The document with its rail plan added: electrical segments leave out Vin (the selected tap supplies it). */
export function addRailPlan(doc: RawDocument): RawDocument {
  const strip = (items: unknown[]): unknown[] =>
    items.map((item) => {
      if (typeof item !== 'object' || item === null) return item;
      const o = item as RawObject;
      if (Array.isArray(o.segments)) return { ...o, segments: strip(o.segments) };
      if (!('vinV' in o) || (o.voutV === undefined && o.iloadA === undefined)) return o;
      const { vinV: _vin, ...rest } = o;
      return rest;
    });
  const profile = doc.profile ? { ...doc.profile, segments: strip(doc.profile.segments ?? []) as typeof doc.profile.segments } : doc.profile;
  return { ...doc, railPlan: starterRailPlan(doc), profile };
}

/** Every source a circuit names, in order. */
function sourcesIn(c: RawCircuit | undefined, out: string[] = []): string[] {
  if (!c) return out;
  if (c.kind === 'source' && typeof c.source === 'string') out.push(c.source);
  for (const child of [...(c.parts ?? []), ...(c.branches ?? [])]) sourcesIn(child, out);
  return out;
}

function renameIn(c: RawCircuit | undefined, from: string, to: string): RawCircuit | undefined {
  if (!c) return c;
  const next: RawCircuit = { ...c };
  if (c.kind === 'source' && c.source === from) next.source = to;
  if (c.parts) next.parts = c.parts.map((p) => renameIn(p, from, to)!);
  if (c.branches) next.branches = c.branches.map((b) => renameIn(b, from, to)!);
  return next;
}

/** Source `index` renamed, and every tap that names it following. */
export function renameSource(plan: RawRailPlan, index: number, id: string): RawRailPlan {
  const from = plan.sources?.[index]?.id;
  const sources = (plan.sources ?? []).map((s, i) => (i === index ? { ...s, id } : s));
  if (!from) return { ...plan, sources };
  return { ...plan, sources, taps: (plan.taps ?? []).map((t) => ({ ...t, circuit: renameIn(t.circuit, from, id) })) };
}

/** Whether any tap's circuit uses the source (it cannot be deleted then). */
export function sourceInUse(plan: RawRailPlan, id: string | undefined): boolean {
  return id !== undefined && (plan.taps ?? []).some((t) => sourcesIn(t.circuit).includes(id));
}

/** A tap added above the highest: one more threshold between it and the one below. */
export function addTap(plan: RawRailPlan): RawRailPlan {
  const taps = plan.taps ?? [];
  const source = plan.sources?.[0]?.id ?? '';
  const tap = { name: `tap ${taps.length + 1}`, circuit: { kind: 'source', source } };
  const thresholds = [...(plan.thresholdsV ?? [])];
  if (taps.length > 0) thresholds.push('');
  return { ...plan, taps: [...taps, tap], thresholdsV: thresholds };
}

/** Tap `index` removed with the threshold above it (or below it, for the highest tap). */
export function removeTap(plan: RawRailPlan, index: number): RawRailPlan {
  const taps = (plan.taps ?? []).filter((_, i) => i !== index);
  const thresholds = [...(plan.thresholdsV ?? [])];
  thresholds.splice(Math.min(index, thresholds.length - 1), 1);
  return { ...plan, taps, thresholdsV: thresholds };
}

/** A circuit node turned into another kind, keeping its diode and ballast and what it held. */
export function changeKind(node: RawCircuit, kind: string, firstSource: string): RawCircuit {
  const { diodeV, ballastOhm } = node;
  const keep = { ...(diodeV !== undefined ? { diodeV } : {}), ...(ballastOhm !== undefined ? { ballastOhm } : {}) };
  const children = node.parts ?? node.branches ?? (node.kind === 'source' ? [{ kind: 'source', source: node.source }] : []);
  if (kind === 'source') return { kind, source: sourcesIn(node)[0] ?? firstSource, ...keep };
  const list = children.length > 0 ? children : [{ kind: 'source', source: firstSource }];
  return kind === 'series' ? { kind, parts: list, ...keep } : { kind, branches: list, ...keep };
}

/** The section's summary line: "2 sources, 2 taps, switching at 21.5 V". */
export function railPlanSummary(plan: RawRailPlan): string {
  const n = (k: number, one: string, many: string) => `${k} ${k === 1 ? one : many}`;
  const thresholds = (plan.thresholdsV ?? []).filter((t): t is number => typeof t === 'number').map((t) => `${Number(t.toPrecision(4))} V`);
  const base = `${n((plan.sources ?? []).length, 'source', 'sources')}, ${n((plan.taps ?? []).length, 'tap', 'taps')}`;
  return thresholds.length > 0 ? `${base}, switching at ${thresholds.join(', ')}` : base;
}
