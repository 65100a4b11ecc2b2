import { cauerToFoster, fosterZth, type CauerStage, type FosterTerm } from '@/core/thermal';

import { logSpaced } from './log-axis';

/** A junction-to-case package model as a study device or a library part stores it. */
export type ThermalModel =
  | { kind: 'foster'; terms: readonly FosterTerm[] }
  | { kind: 'cauer'; stages: readonly CauerStage[] }
  | { kind: 'lumped'; rthKPerW: number; capacityJPerK?: number };

export type ZthPoint = { timeS: number; zthKPerW: number };

/**
 * Zth(t) = instantKPerW + Σ R (1 − e^(−t/τ)): resistances behind no heat capacity respond at
 * once, the rest as a Foster set.
 */
export type ZthEquivalent = { terms: FosterTerm[]; instantKPerW: number };

/**
 * The model's step response as Foster terms. A Cauer stage without capacity is a massless
 * node: its resistance is in series with the one before it (or, at the junction, responds at
 * once); the remaining ladder converts with cauerToFoster (same Zth(t), PHYSICS.md §3).
 */
export function zthEquivalent(model: ThermalModel): ZthEquivalent {
  if (model.kind === 'foster') return { terms: [...model.terms].sort((a, b) => a.tauS - b.tauS), instantKPerW: 0 };
  if (model.kind === 'lumped') {
    const c = model.capacityJPerK ?? 0;
    return c > 0 ? { terms: [{ rKPerW: model.rthKPerW, tauS: model.rthKPerW * c }], instantKPerW: 0 } : { terms: [], instantKPerW: model.rthKPerW };
  }
  let instantKPerW = 0;
  const merged: CauerStage[] = [];
  for (const stage of model.stages) {
    if (stage.capacityJPerK > 0) merged.push({ ...stage });
    else if (merged.length === 0) instantKPerW += stage.rKPerW;
    else merged[merged.length - 1].rKPerW += stage.rKPerW;
  }
  return { terms: merged.length ? cauerToFoster(merged) : [], instantKPerW };
}

export function zthAt(eq: ZthEquivalent, timeS: number): number {
  return eq.instantKPerW + (eq.terms.length ? fosterZth(eq.terms, timeS) : 0);
}

/**
 * The time span worth drawing, s: around the points when there are any (half the first to twice
 * the last), else a decade beyond the fastest and slowest time constants.
 */
export function zthTimeSpan(eq: ZthEquivalent, points: readonly ZthPoint[] = []): [number, number] {
  if (points.length > 0) {
    const times = points.map((p) => p.timeS);
    return [Math.min(...times) / 2, Math.max(...times) * 2];
  }
  if (eq.terms.length === 0) return [1e-4, 10];
  const taus = eq.terms.map((t) => t.tauS);
  return [Math.min(...taus) / 10, Math.max(...taus) * 10];
}

/** Zth(t) sampled at `count` log-spaced times over the span. */
export function zthCurve(eq: ZthEquivalent, span: readonly [number, number], count = 120): ZthPoint[] {
  return logSpaced(span[0], span[1], count).map((timeS) => ({ timeS, zthKPerW: zthAt(eq, timeS) }));
}
