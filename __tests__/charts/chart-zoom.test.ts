import { clampDomain, isFullView, MIN_ZOOM_FRACTION, panToInclude, zoomAround } from '@/charts/chart-zoom';

const FULL: [number, number] = [0, 100];

describe('chart zoom', () => {
  it('halves the view around its centre', () => {
    expect(zoomAround([0, 100], FULL, 50, 0.5)).toEqual([25, 75]);
  });

  it('keeps the chosen time at the same place on the axis', () => {
    // 20 is a fifth of the way across [0, 100]; after zooming it is a fifth across [10, 60].
    expect(zoomAround([0, 100], FULL, 20, 0.5)).toEqual([10, 60]);
  });

  it('widens back and stops at the whole run', () => {
    expect(zoomAround([25, 75], FULL, 50, 2)).toEqual([0, 100]);
    expect(zoomAround([0, 100], FULL, 50, 4)).toEqual([0, 100]);
    expect(isFullView(zoomAround([0, 100], FULL, 50, 4), FULL)).toBe(true);
  });

  it('slides a view that runs past an end instead of cutting it', () => {
    expect(clampDomain([90, 120], FULL)).toEqual([70, 100]);
    expect(clampDomain([-10, 20], FULL)).toEqual([0, 30]);
    expect(clampDomain([60, 40], FULL)).toEqual([40, 60]);
  });

  it('never narrows below the smallest zoom', () => {
    const [a, b] = clampDomain([50, 50], FULL);
    expect(b - a).toBeCloseTo(100 * MIN_ZOOM_FRACTION, 12);
  });

  it('pans to a time outside the view, keeping its width', () => {
    expect(panToInclude([0, 20], FULL, 50)).toEqual([40, 60]);
    expect(panToInclude([0, 20], FULL, 99)).toEqual([80, 100]);
    expect(panToInclude([0, 20], FULL, 10)).toEqual([0, 20]);
  });

  it('refuses a zoom factor that is not positive', () => {
    expect(() => zoomAround([0, 100], FULL, 50, 0)).toThrow(/factor: must be greater than zero, got 0/);
  });
});
