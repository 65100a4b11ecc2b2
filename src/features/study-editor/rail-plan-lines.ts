import type { RawObject } from './types';

const v = (x: unknown, unit: string) => (typeof x === 'number' ? `${Number(x.toPrecision(4))} ${unit}` : '—');

function extras(c: RawObject): string {
  const parts = [c.diodeV !== undefined ? `diode ${v(c.diodeV, 'V')}` : null, c.ballastOhm !== undefined ? `ballast ${v(c.ballastOhm, 'Ω')}` : null];
  const text = parts.filter(Boolean).join(', ');
  return text ? ` (${text})` : '';
}

/** A tap's circuit in a line: "A1 ∥ A2" for parallel, "A1 + A2" for series, with diodes and ballasts. */
export function circuitText(circuit: unknown, depth = 0): string {
  if (typeof circuit !== 'object' || circuit === null || depth > 8) return '?';
  const c = circuit as RawObject;
  if (c.kind === 'source') return `${String(c.source)}${extras(c)}`;
  const inner = (Array.isArray(c.parts) ? c.parts : Array.isArray(c.branches) ? c.branches : []) as unknown[];
  const joined = inner.map((x) => circuitText(x, depth + 1)).join(c.kind === 'parallel' ? ' ∥ ' : ' + ');
  return `${depth > 0 ? `(${joined})` : joined}${extras(c)}`;
}

export type RailPlanFacts = { label: string; value: string }[];

/** The rail plan in plain facts: what it feeds, its sources and taps, when it switches. */
export function railPlanFacts(plan: RawObject): { facts: RailPlanFacts; sources: string[]; taps: string[] } {
  const sources = (Array.isArray(plan.sources) ? (plan.sources as RawObject[]) : []).map(
    (s) => `${String(s.id)}: ${v(s.vocV, 'V')} open circuit, ${v(s.rsOhm, 'Ω')} source resistance, up to ${v(s.imaxA, 'A')}`,
  );
  const taps = (Array.isArray(plan.taps) ? (plan.taps as RawObject[]) : []).map((t, i) => `${i + 1}. ${String(t.name)}: ${circuitText(t.circuit)}`);
  const thresholds = Array.isArray(plan.thresholdsV) ? (plan.thresholdsV as unknown[]).map((x) => v(x, 'V')).join(', ') : '—';
  const relay = plan.relay as RawObject | undefined;
  const map = plan.map as RawObject | undefined;
  const facts: RailPlanFacts = [
    { label: 'Feeds', value: typeof plan.device === 'string' ? plan.device : 'the only pass device' },
    { label: 'Thresholds', value: `${thresholds} on the ${plan.sensed === 'set-point' ? 'set point' : 'output'}, hysteresis ${v(plan.hysteresisV, 'V')}` },
    { label: 'Relay', value: relay ? `breaks for ${v(typeof relay.breakTimeS === 'number' ? relay.breakTimeS * 1000 : undefined, 'ms')}, input ${v(typeof relay.inputCapacitanceF === 'number' ? relay.inputCapacitanceF * 1e6 : undefined, 'µF')}` : 'not given' },
    { label: 'Dissipation map', value: map ? `Vout ${v(map.voutMinV, 'V')}–${v(map.voutMaxV, 'V')}, Iout up to ${v(map.ioutMaxA, 'A')}` : '—' },
  ];
  return { facts, sources, taps };
}
