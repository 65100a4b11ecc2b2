import { FIN_SCAN_Y_SPAN, finScanDomain, finScanVisible } from '@/charts/fin-scan-model';

describe('fin-count scan chart model', () => {
  const rows = [
    { finCount: 4, rsaKPerW: 3.1 },
    { finCount: 2, rsaKPerW: 4.6 },
    { finCount: 8, rsaKPerW: 2.05 },
    { finCount: 16, rsaKPerW: 9.5 },
  ];

  it('spans the lowest Rθsa to at most three times it, on round values', () => {
    const [lo, hi] = finScanDomain(rows);
    expect(lo).toBeLessThanOrEqual(2.05);
    expect(hi).toBeGreaterThanOrEqual(2.05 * FIN_SCAN_Y_SPAN - 1e-9);
    // d3-scale's nice() rounds to a step of 1, 2 or 5 × 10^k: with four ticks over 2.05…6.15 that is 1.
    expect([lo, hi]).toEqual([2, 7]);
  });

  it('leaves out points beyond the axis and orders the rest by fin count', () => {
    const visible = finScanVisible(rows, finScanDomain(rows));
    expect(visible.map((r) => r.finCount)).toEqual([2, 4, 8]);
  });

  it('gives a usable axis for a flat or empty scan', () => {
    const flat = finScanDomain([{ finCount: 2, rsaKPerW: 5 }, { finCount: 3, rsaKPerW: 5 }]);
    expect(flat[0]).toBeLessThanOrEqual(5);
    expect(flat[1]).toBeGreaterThan(5);
    expect(finScanDomain([])).toEqual([0, 1]);
  });
});
