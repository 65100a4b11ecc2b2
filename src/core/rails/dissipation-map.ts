import { MAP_IOUT_STEPS, MAP_VOUT_STEPS } from './constants';
import { CELL_NOT_SERVED, evaluateCell, serviceRange } from './cell';
import { checkRange } from './check-range';
import { checkElement } from './element';
import type { OutputRange, PassElement, RailModel } from './types';

/** Row-major over (Vout index, Iout index): cell = v * ioutA.length + i. */
export type MapLayer = { powerW: Float64Array; status: Uint8Array };

export type DissipationMap = {
  voutV: Float64Array;
  ioutA: Float64Array;
  /** One layer per tap; cells outside the tap's service range are not served. */
  taps: MapLayer[];
  /**
   * Per cell, over the taps that may serve it (two inside a hysteresis band): the highest
   * power and its tap (−1 when none gives one), and the most severe mark among them.
   */
  overall: MapLayer & { tapIndex: Int8Array };
};

const axis = (from: number, to: number, n: number) => Float64Array.from({ length: n }, (_, k) => (n === 1 ? from : from + ((to - from) * k) / (n - 1)));

/**
 * Dissipation of the element over a Vout × Iout grid (PHYSICS.md §2, the saw-tooth map):
 * P = (Vtap(I) − Vout)·I + Vtap·Iq. Cells beyond a tap's capability, the element's current
 * limit, or in dropout are marked (see CELL_STATUS), never left out.
 */
export function dissipationMap(
  model: RailModel,
  element: PassElement,
  range: OutputRange,
  steps: { vout?: number; iout?: number } = {},
): DissipationMap {
  checkElement(element);
  checkRange(range);
  const nv = steps.vout ?? MAP_VOUT_STEPS;
  const ni = steps.iout ?? MAP_IOUT_STEPS;
  for (const [n, name] of [[nv, 'steps.vout'], [ni, 'steps.iout']] as const) {
    if (!Number.isInteger(n) || n < 2) throw new RangeError(`${name}: must be a whole number ≥ 2, got ${n}`);
  }
  const voutV = axis(range.voutMinV, range.voutMaxV, nv);
  const ioutA = axis(0, range.ioutMaxA, ni);
  const cells = nv * ni;
  const overall = { powerW: new Float64Array(cells).fill(Number.NaN), status: new Uint8Array(cells).fill(CELL_NOT_SERVED), tapIndex: new Int8Array(cells).fill(-1) };
  const taps = model.taps.map((tap, k): MapLayer => {
    const { fromV, toV } = serviceRange(model.plan, k);
    const layer = { powerW: new Float64Array(cells).fill(Number.NaN), status: new Uint8Array(cells).fill(CELL_NOT_SERVED) };
    for (let v = 0; v < nv; v++) {
      if (voutV[v] < fromV || voutV[v] > toV) continue;
      for (let i = 0; i < ni; i++) {
        const c = v * ni + i;
        const cell = evaluateCell(tap, element, voutV[v], ioutA[i]);
        layer.powerW[c] = cell.powerW;
        layer.status[c] = cell.status;
        overall.status[c] = overall.status[c] === CELL_NOT_SERVED ? cell.status : Math.max(overall.status[c], cell.status);
        if (cell.powerW > overall.powerW[c] || (Number.isNaN(overall.powerW[c]) && !Number.isNaN(cell.powerW))) {
          overall.powerW[c] = cell.powerW;
          overall.tapIndex[c] = k;
        }
      }
    }
    return layer;
  });
  return { voutV, ioutA, taps, overall };
}
