import type { CurvePoint } from './types';
import { asArray, asObject, fieldPath, onlyKeys, rangeFail, readNumber, type NumberRule } from './field-reader';

export type AxisRule = { key: string } & NumberRule;

/**
 * Reads `{ points: [{ <x.key>, <y.key> }] }` (at least one point, x strictly increasing) into
 * `{ x, y }` pairs.
 */
export function parseCurve(value: unknown, path: string, x: AxisRule, y: AxisRule): CurvePoint[] {
  const obj = asObject(value, path);
  onlyKeys(obj, ['points'], path);
  const pointsPath = fieldPath(path, 'points');
  const points = asArray(obj.points, pointsPath, 1).map((item, i) => {
    const p = fieldPath(pointsPath, i);
    const point = asObject(item, p);
    onlyKeys(point, [x.key, y.key], p);
    return { x: readNumber(point, x.key, p, x), y: readNumber(point, y.key, p, y) };
  });
  for (let i = 1; i < points.length; i++) {
    if (points[i].x <= points[i - 1].x) {
      rangeFail(fieldPath(fieldPath(pointsPath, i), x.key), `must be above the previous point's ${points[i - 1].x}${x.unit ? ` ${x.unit}` : ''} (points go in increasing ${x.key})`);
    }
  }
  return points;
}
