import { overlaps, placeLabels, type Box } from '@/charts/label-layout';

const BOUNDS: Box = { x: 0, y: 0, width: 300, height: 200 };
const at = (x: number, y: number, width = 50, height = 12): Box => ({ x, y, width, height });

describe('label layout', () => {
  it('counts boxes that share area as overlapping and touching ones as clear', () => {
    // Axis-aligned rectangles overlap when their intervals overlap on both axes (separating-axis test).
    expect(overlaps(at(0, 0), at(49, 11))).toBe(true);
    expect(overlaps(at(0, 0), at(50, 0))).toBe(false);
    expect(overlaps(at(0, 0), at(0, 12))).toBe(false);
  });

  it('takes the first free candidate and moves the next label to its second choice', () => {
    const first = [at(100, 50), at(100, 80)];
    const second = [at(120, 55), at(120, 90)];
    expect(placeLabels([first, second], [], BOUNDS)).toEqual([at(100, 50), at(120, 90)]);
  });

  it('keeps clear of fixed labels and of the plot edges, and drops a label with no room', () => {
    const fixed = [at(200, 20, 100)];
    const placed = placeLabels([[at(220, 24), at(280, 40)], [at(10, 10)]], fixed, BOUNDS);
    // (220, 24) hits the fixed label and (280, 40) runs past x = 300: no free place.
    expect(placed).toEqual([null, at(10, 10)]);
  });
});
