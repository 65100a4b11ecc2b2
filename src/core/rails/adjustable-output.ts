import { checkNumber } from './check';
import { ADJUSTABLE_VREF_V } from './constants';

export type AdjustableDivider = {
  r1Ohm: number;
  r2Ohm: number;
  /** Default ADJUSTABLE_VREF_V. */
  vrefV?: number;
  /** Adjust-pin current, A (tens of µA, common practice); omit to neglect it. */
  iadjA?: number;
};

/** Output set by the divider of an adjustable regulator: Vout = Vref (1 + R2/R1) + Iadj·R2 (PHYSICS.md §1). */
export function adjustableOutputV(d: AdjustableDivider): number {
  const r1 = checkNumber(d?.r1Ohm, 'divider.r1Ohm', 0, true);
  const r2 = checkNumber(d.r2Ohm, 'divider.r2Ohm', 0);
  const vref = d.vrefV === undefined ? ADJUSTABLE_VREF_V : checkNumber(d.vrefV, 'divider.vrefV', 0, true);
  const iadj = d.iadjA === undefined ? 0 : checkNumber(d.iadjA, 'divider.iadjA', 0);
  return vref * (1 + r2 / r1) + iadj * r2;
}

export type AdjustableTop = { dividerV: number; reachableV: number; limitedBy: 'divider' | 'dropout' };

/**
 * Top of the output range: the divider's value, unless the input less the dropout lies below
 * it, when the dropout sets the top (Vout ≈ Vin − Vdropout, PHYSICS.md §1).
 */
export function adjustableTopOfRange(d: AdjustableDivider, vinV: number, dropoutV: number): AdjustableTop {
  const dividerV = adjustableOutputV(d);
  const headroomV = checkNumber(vinV, 'vinV') - checkNumber(dropoutV, 'dropoutV', 0);
  return headroomV < dividerV
    ? { dividerV, reachableV: Math.max(0, headroomV), limitedBy: 'dropout' }
    : { dividerV, reachableV: dividerV, limitedBy: 'divider' };
}
