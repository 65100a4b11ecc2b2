import { interpolateLinear } from '../electrical';
import { checkArray, checkNumber } from './check';
import type { PassElement } from './types';

export const dropoutAt = (e: PassElement, currentA: number): number =>
  typeof e.dropout === 'number' ? e.dropout : interpolateLinear(e.dropout, currentA);

/** The element's current limit at a differential, A (Infinity without one). */
export const limitAt = (e: PassElement, differentialV: number): number =>
  e.currentLimit ? interpolateLinear(e.currentLimit, differentialV) : Infinity;

export function checkElement(e: PassElement, path = 'element'): void {
  if (e == null || typeof e !== 'object') throw new TypeError(`${path}: expected a pass element`);
  checkNumber(e.iqA, `${path}.iqA`, 0);
  if (typeof e.dropout === 'number') checkNumber(e.dropout, `${path}.dropout`, 0);
  else checkCurve(e.dropout, `${path}.dropout`);
  if (e.currentLimit !== undefined) checkCurve(e.currentLimit, `${path}.currentLimit`);
}

function checkCurve(points: PassElement['currentLimit'], path: string): void {
  checkArray(points, path, 1);
  points!.forEach((p, k) => {
    checkNumber(p.x, `${path}[${k}].x`);
    checkNumber(p.y, `${path}[${k}].y`, 0);
    if (k > 0 && !(p.x > points![k - 1].x)) throw new RangeError(`${path}[${k}].x: must rise`);
  });
}
