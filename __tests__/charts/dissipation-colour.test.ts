import { inkOn, parseColour, POWER_STOPS, powerScale, relativeLuminance } from '@/charts/dissipation-colour';

import { assertInDelta } from '../helpers/assert-in-delta';

describe('dissipation colour scale', () => {
  it('measures lightness as WCAG 2.1 relative luminance', () => {
    // WCAG 2.1, definition of relative luminance: white 1, black 0 by construction.
    assertInDelta(relativeLuminance('#FFFFFF'), 1, 1e-12, 'white');
    assertInDelta(relativeLuminance('#000000'), 0, 1e-12, 'black');
    // #767676 on white is the widely quoted 4.54:1 contrast ratio, (1 + 0.05) / (L + 0.05) (from memory).
    assertInDelta((1 + 0.05) / (relativeLuminance('#767676') + 0.05), 4.54, 0.005, 'contrast of #767676 on white');
    // Pure primaries weigh 0.2126, 0.7152 and 0.0722 (WCAG 2.1, ITU-R BT.709 coefficients).
    assertInDelta(relativeLuminance('rgb(255, 0, 0)'), 0.2126, 1e-12, 'red');
    assertInDelta(relativeLuminance('#00FF00'), 0.7152, 1e-12, 'green');
  });

  it('runs from the first stop at 0 W to the last at the highest power, clamped outside', () => {
    const scale = powerScale(84.5);
    expect(parseColour(scale.colour(0))).toEqual(parseColour(POWER_STOPS[0]));
    expect(parseColour(scale.colour(84.5))).toEqual(parseColour(POWER_STOPS[POWER_STOPS.length - 1]));
    expect(scale.colour(-3)).toBe(scale.colour(0));
    expect(scale.colour(1e6)).toBe(scale.colour(84.5));
    expect(scale.domain).toEqual([0, 84.5]);
  });

  it('gets darker all the way up, so the map reads in greyscale', () => {
    const scale = powerScale(10);
    let previous = Infinity;
    for (let k = 0; k <= 200; k++) {
      const l = relativeLuminance(scale.colour((10 * k) / 200));
      expect(l).toBeLessThan(previous);
      previous = l;
    }
    // Lightest and darkest stops lie far apart: a contrast ratio of at least 7:1 (WCAG 2.1 AAA for text).
    const ratio = (relativeLuminance(POWER_STOPS[0]) + 0.05) / (relativeLuminance(POWER_STOPS[POWER_STOPS.length - 1]) + 0.05);
    expect(ratio).toBeGreaterThan(7);
  });

  it('puts legend ticks at round values inside the range', () => {
    const { ticks } = powerScale(84.5);
    expect(ticks[0]).toBe(0);
    for (const t of ticks) {
      expect(t).toBeGreaterThanOrEqual(0);
      expect(t).toBeLessThanOrEqual(84.5);
      // Round values: a 1, 2 or 5 times a power of ten step (d3-scale's tick rule).
      const step = ticks[1] - ticks[0];
      const mantissa = step / 10 ** Math.floor(Math.log10(step));
      expect([1, 2, 5]).toContain(Math.round(mantissa));
    }
    expect(ticks.length).toBeGreaterThanOrEqual(3);
  });

  it('uses a zero-to-one scale when nothing dissipates', () => {
    expect(powerScale(0).domain).toEqual([0, 1]);
    expect(powerScale(Number.NaN).domain).toEqual([0, 1]);
  });

  it('picks dark ink on the pale end and light ink on the dark end', () => {
    expect(inkOn(POWER_STOPS[0])).toBe('dark');
    expect(inkOn(POWER_STOPS[POWER_STOPS.length - 1])).toBe('light');
  });

  it('names a malformed colour', () => {
    expect(() => parseColour('teal')).toThrow('colour: expected #rrggbb or rgb(r, g, b), got "teal"');
  });
});
