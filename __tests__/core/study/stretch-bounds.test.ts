import { createStretchBounds } from '@/core/study/stretch-bounds';
import { advance, compileNetwork, peakInSegment, AMBIENT } from '@/core/thermal';
import { seededRandom } from '../../helpers/seeded-random';

describe('stretch bounds', () => {
  it('bound the exact temperature from above and below over random stretches of a random ladder', () => {
    // Reference: the thermal core's exact peak search and dense sampling of its exact solution.
    const rand = seededRandom(5);
    const nodes = Array.from({ length: 6 }, (_, i) => ({ id: `n${i}`, capacityJPerK: i === 2 ? 0 : 0.01 + 10 * rand() }));
    const links = nodes.map((n, i) => ({ a: n.id, b: i + 1 < nodes.length ? nodes[i + 1].id : AMBIENT, rKPerW: 0.05 + rand() }));
    links.push({ a: 'n0', b: 'n3', rKPerW: 2 });
    const model = compileNetwork({ nodes, links, heatInputs: ['n0', 'n4'] });
    const bounds = createStretchBounds(model);
    for (let trial = 0; trial < 50; trial++) {
      const T = Float64Array.from(nodes, () => 20 + 100 * rand());
      const u = [50 * rand(), 30 * rand(), 25];
      const h = Math.pow(10, -3 + 5 * rand());
      bounds.load(T, u, h);
      for (let k = 0; k < nodes.length; k++) {
        const peak = peakInSegment(model, T, u, h, k).valueC;
        expect(bounds.upper(k)).toBeGreaterThanOrEqual(peak - 1e-9);
        // The larger end value, from the exact solution at τ = 0 (massless nodes at u) and τ = h.
        const ends = Math.max(advance(model, T, u, 0)[k], advance(model, T, u, h)[k]);
        expect(Math.abs(bounds.endMax(k) - ends)).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(ends)));
        expect(bounds.endMax(k)).toBeLessThanOrEqual(peak + 1e-9);
        for (let s = 0; s <= 20; s++) {
          const v = advance(model, T, u, (h * s) / 20)[k];
          expect(bounds.lower(k)).toBeLessThanOrEqual(v + 1e-9);
          expect(bounds.upper(k)).toBeGreaterThanOrEqual(v - 1e-9);
        }
      }
    }
  });

  it('settle the maximum to the tolerance on the hot side, never below the exact peak', () => {
    // Reference: the thermal core's exact peak search (roots of the derivative, PHYSICS.md §3) and dense sampling of the exact solution.
    const rand = seededRandom(11);
    const nodes = Array.from({ length: 6 }, (_, i) => ({ id: `n${i}`, capacityJPerK: i === 2 ? 0 : 0.01 + 10 * rand() }));
    const links = nodes.map((n, i) => ({ a: n.id, b: i + 1 < nodes.length ? nodes[i + 1].id : AMBIENT, rKPerW: 0.05 + rand() }));
    const model = compileNetwork({ nodes, links, heatInputs: ['n0', 'n4'] });
    const bounds = createStretchBounds(model);
    let settled = 0;
    let interior = 0;
    const reached = new Float64Array(2);
    for (let trial = 0; trial < 60; trial++) {
      const T = Float64Array.from(nodes, () => 20 + 100 * rand());
      const u = [50 * rand(), 30 * rand(), 25];
      const h = Math.pow(10, -3 + 5 * rand());
      bounds.load(T, u, h);
      for (let k = 0; k < nodes.length; k++) {
        for (const tol of [1e-3, 1e-6]) {
          const hot = bounds.maxWithin(k, tol, reached);
          if (Number.isNaN(hot)) continue;
          settled++;
          const peak = peakInSegment(model, T, u, h, k).valueC;
          expect(hot).toBeGreaterThanOrEqual(peak - 1e-9);
          expect(hot).toBeLessThanOrEqual(peak + tol + 1e-9);
          // The point reached lies on the exact curve, within tol below its maximum.
          const [value, tau] = reached;
          expect(tau).toBeGreaterThanOrEqual(0);
          expect(tau).toBeLessThanOrEqual(h);
          expect(Math.abs(value - advance(model, T, u, tau)[k])).toBeLessThanOrEqual(1e-9 * Math.max(1, Math.abs(value)));
          expect(value).toBeGreaterThanOrEqual(peak - tol - 1e-9);
          expect(value).toBeLessThanOrEqual(peak + 1e-9);
          if (tau > 0 && tau < h) interior++;
          for (let s = 0; s <= 40; s++) expect(hot).toBeGreaterThanOrEqual(advance(model, T, u, (h * s) / 40)[k] - 1e-9);
        }
      }
    }
    // Most stretches settle without the exact search (the point of the method).
    expect(settled).toBeGreaterThan(0.9 * 60 * 6 * 2);
    // Some maxima lie inside the stretch, where the point reached is a midpoint of the search.
    expect(interior).toBeGreaterThan(0);
  });
});
