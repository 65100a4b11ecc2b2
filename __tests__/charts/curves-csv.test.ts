import Papa from 'papaparse';

import { curvesCsv, curvesFileName } from '@/charts/curves-csv';

describe('curves CSV', () => {
  const series = {
    'Q1.junction': { timeS: [0, 10], valueC: [25, 45] },
    ambient: { timeS: [0, 5, 10], valueC: [25, 25, 25] },
  };

  it('writes time and one column per series on the union of their times', () => {
    // Read back with a general-purpose CSV parser (papaparse) rather than by string matching.
    const parsed = Papa.parse<string[]>(curvesCsv(series).trim());
    expect(parsed.errors).toEqual([]);
    expect(parsed.data[0]).toEqual(['time_s', 'Q1.junction_c', 'ambient_c']);
    expect(parsed.data.slice(1).map((row) => row.map(Number))).toEqual([
      [0, 25, 25],
      // 5 s is only an ambient point: the junction is read on its straight line, 25 + 20 × 5/10.
      [5, 35, 25],
      [10, 45, 25],
    ]);
  });

  it('leaves a cell empty where a series has no value', () => {
    const rows = Papa.parse<string[]>(curvesCsv({ a: { timeS: [0, 1], valueC: [1, 2] }, b: { timeS: [1, 2], valueC: [3, 4] } }).trim()).data;
    expect(rows.slice(1)).toEqual([
      ['0', '1', ''],
      ['1', '2', '3'],
      ['2', '', '4'],
    ]);
  });

  it('names the file after the study', () => {
    expect(curvesFileName('Bench electronic load (demo data)')).toBe('bench-electronic-load-demo-data-curves.csv');
    expect(curvesFileName('±°')).toBe('study-curves.csv');
    // Cut at 60 characters without leaving a dangling hyphen.
    expect(curvesFileName('Bench electronic load, two MOSFETs on a fan-cooled sink (demo data)')).toBe(
      'bench-electronic-load-two-mosfets-on-a-fan-cooled-sink-demo-curves.csv',
    );
  });
});
