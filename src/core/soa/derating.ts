import { interpolateLinear } from '../electrical';
import { SOA_REFERENCE_CASE_C } from './constants';
import type { Derating } from './types';

/** Fraction of the 25 °C second-breakdown current kept at case temperature caseC (≥ 0). */
export function deratingFactor(d: Derating, caseC: number): number {
  if (d.kind === 'linear') {
    if (caseC <= SOA_REFERENCE_CASE_C) return 1;
    return Math.max(0, 1 - d.fractionPerK * (caseC - SOA_REFERENCE_CASE_C));
  }
  const curve = d.points.map((p) => ({ x: p.caseC, y: p.factor }));
  return Math.max(0, interpolateLinear(curve, caseC));
}

/**
 * Thermal derating of a 25 °C datasheet boundary: Pmax ∝ Tj,max − Tc (PHYSICS.md §4), so the
 * thermal line keeps (Tj,max − Tc)/(Tj,max − 25) of its current, whatever the pulse width.
 * Capped at 1: the curve says nothing about a case cooler than 25 °C.
 */
export function thermalDeratingFactor(tjMaxC: number, caseC: number): number {
  const f = (tjMaxC - caseC) / (tjMaxC - SOA_REFERENCE_CASE_C);
  return Math.min(1, Math.max(0, f));
}
