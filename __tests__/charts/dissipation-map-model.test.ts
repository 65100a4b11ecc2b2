import fs from 'node:fs';
import path from 'node:path';

import { cellAt, cellEdges, cellMark, cellRuns, highestPower, statusesPresent, tapBoundaries, tapRegions } from '@/charts/dissipation-map-model';
import { evaluateStudy, parseStudy, type CellStatus } from '@/core/study';

import { assertInDelta } from '../helpers/assert-in-delta';

const labSupply = () =>
  evaluateStudy(parseStudy(JSON.parse(fs.readFileSync(path.join(__dirname, '../../examples/lab-supply-two-tap.json'), 'utf8')))).railPlan!;

describe('dissipation map model', () => {
  it('draws every cell status its own way and never colours a cell without power', () => {
    expect(cellMark('ok', 12)).toMatchObject({ fill: 'power', pattern: 'none' });
    // Dropout keeps the sagged output's power under a hatch (PHYSICS.md §1: the output falls to Vin − Vdropout).
    expect(cellMark('dropout', 12)).toMatchObject({ fill: 'power', pattern: 'hatch' });
    expect(cellMark('current-limit', null)).toMatchObject({ fill: 'neutral', pattern: 'lines' });
    expect(cellMark('over-capacity', null)).toMatchObject({ fill: 'neutral', pattern: 'dots' });
    expect(cellMark('not-served', null)).toMatchObject({ fill: 'blank', pattern: 'cross' });
    expect(cellMark('ok', null).fill).toBe('neutral');
    const patterns = (['dropout', 'current-limit', 'over-capacity', 'not-served'] as CellStatus[]).map((s) => cellMark(s, 1).pattern);
    expect(new Set(patterns).size).toBe(4);
    expect(() => cellMark('sagging' as CellStatus, 1)).toThrow('status: unknown cell status "sagging"');
  });

  it('centres each cell on its grid value, half a step beyond the ends', () => {
    expect(cellEdges([0, 10, 20])).toEqual([-5, 5, 15, 25]);
    cellEdges([0, 0.12, 0.24]).forEach((edge, k) => assertInDelta(edge, [-0.06, 0.06, 0.18, 0.3][k], 1e-15, `edge ${k}`));
    expect(cellEdges([3])).toEqual([2.5, 3.5]);
    expect(cellEdges([])).toEqual([]);
  });

  it('finds the edges where the tap changes between neighbouring cells (worked by hand on a 3 × 2 grid)', () => {
    // tap[v][i]: at 0 V tap 1 (index 0) everywhere; at 10 V tap 2 only at 1 A; at 20 V tap 2 throughout.
    const edges = tapBoundaries([[0, 0], [0, 1], [1, 1]], [0, 10, 20], [0, 1]);
    expect(edges).toEqual([
      { x0: 5, y0: 0.5, x1: 5, y1: 1.5 },
      { x0: 15, y0: -0.5, x1: 15, y1: 0.5 },
      { x0: 5, y0: 0.5, x1: 15, y1: 0.5 },
    ]);
    expect(tapRegions([[0, 0], [0, 1], [1, 1]], [0, 10, 20], 2)).toEqual([{ fromV: -5, toV: 15 }, { fromV: 5, toV: 25 }]);
    // Above the taps' capability no tap serves (−1): that edge is no boundary between taps.
    expect(tapBoundaries([[0, -1], [1, -1]], [0, 10], [0, 1])).toEqual([{ x0: 5, y0: -0.5, x1: 5, y1: 0.5 }]);
  });

  it('puts the lab supply’s tap boundary inside the hysteresis band around its threshold', () => {
    // PHYSICS.md §2: up to tap k+1 above θk + h/2, down below θk − h/2; inside the band both taps
    // may serve, and the map shows the higher power. So the change lies within θ ± h/2, to half a grid step.
    const plan = labSupply();
    const { voutV, ioutA, overall } = plan.map;
    const step = voutV[1] - voutV[0];
    const [theta] = plan.thresholdsV;
    const h = plan.hysteresisV;
    const edges = tapBoundaries(overall.tap, voutV, ioutA);
    expect(edges.length).toBeGreaterThan(0);
    for (const e of edges) {
      expect(e.x0).toBe(e.x1);
      expect(e.x0).toBeGreaterThanOrEqual(theta - h / 2 - step / 2);
      expect(e.x0).toBeLessThanOrEqual(theta + h / 2 + step / 2);
    }
    // One straight boundary across every current of the map.
    expect(edges).toHaveLength(ioutA.length);
    const regions = tapRegions(overall.tap, voutV, plan.taps.length);
    assertInDelta(regions[0]!.toV, regions[1]!.fromV, 1e-12, 'the taps meet at one voltage');
  });

  it('finds the highest power and the statuses a map holds, in legend order', () => {
    expect(highestPower([[1, null, 7.5], [Number.NaN, 3, null]])).toBe(7.5);
    expect(highestPower([[null]])).toBe(0);
    expect(statusesPresent([['not-served', 'ok'], ['dropout', 'ok']])).toEqual(['ok', 'dropout', 'not-served']);
  });

  it('merges neighbouring cells of one status and colour step into runs', () => {
    const runs = cellRuns(
      [
        [0, 0.1, 9.9],
        [5, null, null],
      ],
      [
        ['ok', 'ok', 'ok'],
        ['dropout', 'current-limit', 'current-limit'],
      ],
      10,
      10,
    );
    expect(runs).toEqual([
      { v: 0, iFrom: 0, iTo: 1, status: 'ok', bin: 0 },
      { v: 0, iFrom: 2, iTo: 2, status: 'ok', bin: 9 },
      { v: 1, iFrom: 0, iTo: 0, status: 'dropout', bin: 5 },
      { v: 1, iFrom: 1, iTo: 2, status: 'current-limit', bin: -1 },
    ]);
    expect(() => cellRuns([], [], 1, 0)).toThrow('bins: must be a whole number of 1 or more, got 0');
  });

  it('finds the cell under a point, or none outside the grid', () => {
    expect(cellAt([0, 10, 20], [0, 1], 4.9, 0.2)).toEqual({ v: 0, i: 0 });
    expect(cellAt([0, 10, 20], [0, 1], 5.1, 0.6)).toEqual({ v: 1, i: 1 });
    expect(cellAt([0, 10, 20], [0, 1], 26, 0)).toBeNull();
  });
});
