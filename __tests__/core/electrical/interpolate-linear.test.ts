import { interpolateLinear } from '@/core/electrical';
import { assertInDelta } from '../../helpers/assert-in-delta';

const curve = [
  { x: 5, y: 1.5 },
  { x: 15, y: 1.1 },
  { x: 25, y: 0.45 },
];

describe('interpolateLinear', () => {
  it('follows the straight line between neighbouring points', () => {
    // Two-point form of a line (textbook): y = y0 + (x − x0)(y1 − y0)/(x1 − x0); at x = 10: 1.5 − 0.4/2 = 1.3.
    assertInDelta(interpolateLinear(curve, 10), 1.3, 1e-12, 'y(10)');
    // At x = 22: 1.1 + 7 · (−0.65/10) = 0.645.
    assertInDelta(interpolateLinear(curve, 22), 0.645, 1e-12, 'y(22)');
  });

  it('returns the points themselves at their x', () => {
    curve.forEach((p) => assertInDelta(interpolateLinear(curve, p.x), p.y, 0, `y(${p.x})`));
  });

  it('holds the end values flat outside the points', () => {
    expect(interpolateLinear(curve, 0)).toBe(1.5);
    expect(interpolateLinear(curve, 100)).toBe(0.45);
  });

  it('throws a RangeError for an empty curve', () => {
    expect(() => interpolateLinear([], 1)).toThrow(RangeError);
  });
});
