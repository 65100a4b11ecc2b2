import { AIR_300K, idealGasExpansion } from './air';
import { checkFinite, checkPositive } from './check';
import { optimumPlateSpacing } from './parallel-plates';
import { checkPlateFin, type PlateFinGeometry } from './plate-fin-geometry';
import { naturalAtRise, type EstimateOptions } from './plate-fin-natural';
import type { EstimateNotes } from './estimate';

export type FinCountScan = EstimateNotes & {
  /** Fin count with the lowest natural-convection Rθsa at the rise, and its figures. */
  best: { finCount: number; spacingM: number; rsaKPerW: number };
  /** Every fin count that fits, in order. */
  table: { finCount: number; spacingM: number; rsaKPerW: number }[];
  /** Bar-Cohen & Rohsenow s_opt at this rise and the fin count closest to it. */
  optimumSpacingM: number;
  finCountForOptimumSpacing: number;
};

/**
 * Scans the fin count of an extrusion (everything else fixed) for the lowest natural-
 * convection Rθsa at riseK, and sets the result beside the analytic optimum spacing
 * (the count whose spacing s = (W − N t)/(N − 1) is nearest s_opt).
 */
export function scanFinCount(geometry: Omit<PlateFinGeometry, 'finCount'>, riseK: number, options: EstimateOptions = {}): FinCountScan {
  checkPositive(riseK, 'riseK');
  const base = { ...geometry, finCount: 2 };
  const first = checkPlateFin(base);
  const ambientC = options.ambientC === undefined ? 25 : checkFinite(options.ambientC, 'options.ambientC');
  const { baseWidthM: W, finThicknessM: t } = first;
  const table: FinCountScan['table'] = [];
  for (let N = 2; W - N * t > 0; N++) {
    const shape = checkPlateFin({ ...base, finCount: N });
    table.push({ finCount: N, spacingM: shape.spacingM, rsaKPerW: naturalAtRise(shape, riseK, options).rsaKPerW });
  }
  const best = table.reduce((a, b) => (b.rsaKPerW < a.rsaKPerW ? b : a));
  const bestEstimate = naturalAtRise(checkPlateFin({ ...base, finCount: best.finCount }), riseK, options);
  const sOpt = optimumPlateSpacing(first.lengthM, riseK, idealGasExpansion(ambientC + riseK, ambientC), options.air ?? AIR_300K);
  const nearest = table.reduce((a, b) => (Math.abs(b.spacingM - sOpt) < Math.abs(a.spacingM - sOpt) ? b : a));
  return {
    best,
    table,
    optimumSpacingM: sOpt,
    finCountForOptimumSpacing: nearest.finCount,
    assumptions: [
      'Only the fin count varies; width, length, fin height and thickness stay as given.',
      's_opt is Bar-Cohen & Rohsenow’s result for isothermal plates; fin efficiency, radiation and the base floor move the model’s best count off it.',
      ...bestEstimate.assumptions,
    ],
    validity: bestEstimate.validity,
    withinRange: bestEstimate.withinRange,
  };
}
