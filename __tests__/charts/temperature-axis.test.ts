import { formatTemperature, MIN_TEMPERATURE_SPAN_K, temperatureDomain, temperatureTicks } from '@/charts/temperature-axis';

describe('temperature axis', () => {
  it('extends the data range to round values that hold it', () => {
    // 62.3–142.4 °C over about 5 ticks: (142.4 − 62.3) / 5 ≈ 16 → nice step 20 (1, 2 or 5 × 10^k,
    // d3-array "ticks"), so the axis runs from 60 to 160 °C.
    expect(temperatureDomain(62.3, 142.4, 5)).toEqual([60, 160]);
  });

  it('gives a flat curve an axis MIN_TEMPERATURE_SPAN_K tall around its value', () => {
    const [low, high] = temperatureDomain(40, 40, 5);
    expect(high - low).toBeGreaterThanOrEqual(MIN_TEMPERATURE_SPAN_K);
    expect(low).toBeLessThan(40);
    expect(high).toBeGreaterThan(40);
    expect([low, high]).toEqual([38, 42]);
  });

  it('falls back to 0–100 °C when there is nothing to show', () => {
    expect(temperatureDomain(Infinity, -Infinity, 5)).toEqual([0, 100]);
  });

  it('labels ticks without needless decimals and reads values to 0.1 °C', () => {
    expect(temperatureTicks([60, 160], 5).map((t) => t.label)).toEqual(['60', '80', '100', '120', '140', '160']);
    expect(formatTemperature(142.3947)).toBe('142.4\u00a0°C');
  });
});
