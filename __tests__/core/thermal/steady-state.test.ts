import { advance, compileNetwork, runProfile, steadyState, zth } from '@/core/thermal';
import { assertInDelta } from '../../helpers/assert-in-delta';

// Junction → case → sink → ambient with one power input.
const chain = {
  nodes: [
    { id: 'junction', capacityJPerK: 0.05 },
    { id: 'case', capacityJPerK: 2 },
    { id: 'sink', capacityJPerK: 150 },
  ],
  links: [
    { a: 'junction', b: 'case', rKPerW: 1.2 },
    { a: 'case', b: 'sink', rKPerW: 0.4 },
    { a: 'sink', b: 'ambient', rKPerW: 2.1 },
  ],
  heatInputs: ['junction'],
};

describe('steadyState', () => {
  it('series chain: each node sits P × (sum of resistances below it) above ambient', () => {
    const model = compileNetwork(chain);
    const T = steadyState(model, [10, 25]);
    // Ohm's-law analogue of series resistances (textbook).
    assertInDelta(T[0], 25 + 10 * (1.2 + 0.4 + 2.1), 1e-12, 'junction');
    assertInDelta(T[1], 25 + 10 * (0.4 + 2.1), 1e-12, 'case');
    assertInDelta(T[2], 25 + 10 * 2.1, 1e-12, 'sink');
  });

  it('the same with massless case and sink nodes (static condensation)', () => {
    const model = compileNetwork({
      ...chain,
      nodes: chain.nodes.map((n) => (n.id === 'junction' ? n : { ...n, capacityJPerK: 0 })),
    });
    expect(model.modeCount).toBe(1);
    const T = advance(model, [25, 0, 0], [10, 25], 1e3);
    // Series sum again (textbook), reached after 1e3 s ≫ τ = 0.05 × 3.7 s.
    assertInDelta(T[0], 25 + 10 * 3.7, 1e-9, 'junction');
    assertInDelta(T[1], 25 + 10 * 2.5, 1e-9, 'case');
    assertInDelta(T[2], 25 + 10 * 2.1, 1e-9, 'sink');
  });

  it('two devices on one sink: the sink carries the sum of their powers', () => {
    const model = compileNetwork({
      nodes: [
        { id: 'q1', capacityJPerK: 1 },
        { id: 'q2', capacityJPerK: 1 },
        { id: 'sink', capacityJPerK: 100 },
      ],
      links: [
        { a: 'q1', b: 'sink', rKPerW: 0.8 },
        { a: 'q2', b: 'sink', rKPerW: 0.5 },
        { a: 'sink', b: 'ambient', rKPerW: 1.5 },
      ],
      heatInputs: ['q1', 'q2'],
    });
    const T = steadyState(model, [6, 4, 30]);
    // Superposition on a series/parallel resistor network (textbook).
    assertInDelta(T[2], 30 + 10 * 1.5, 1e-12, 'sink');
    assertInDelta(T[0], 30 + 10 * 1.5 + 6 * 0.8, 1e-12, 'q1');
    assertInDelta(T[1], 30 + 10 * 1.5 + 4 * 0.5, 1e-12, 'q2');
  });

  it('parallel paths to ambient combine as 1/(1/R1 + 1/R2)', () => {
    const model = compileNetwork({
      nodes: [{ id: 'n', capacityJPerK: 3 }],
      links: [
        { a: 'n', b: 'ambient', rKPerW: 2 },
        { a: 'ambient', b: 'n', rKPerW: 3 },
      ],
      heatInputs: ['n'],
    });
    // Parallel resistances (textbook): 2 ∥ 3 = 1.2 K/W.
    assertInDelta(steadyState(model, [5, 20])[0], 20 + 5 * 1.2, 1e-12, 'node');
    assertInDelta(zth(model, 0, 0, 1e9), 1.2, 1e-12, 'Zth(∞)');
  });

  it('purely resistive network follows its inputs instantly', () => {
    const model = compileNetwork({
      nodes: [
        { id: 'j', capacityJPerK: 0 },
        { id: 'c', capacityJPerK: 0 },
      ],
      links: [
        { a: 'j', b: 'c', rKPerW: 1 },
        { a: 'c', b: 'ambient', rKPerW: 2 },
      ],
      heatInputs: ['j'],
    });
    expect(model.modeCount).toBe(0);
    // Series sum (textbook) at any instant, even t = 0.
    expect(advance(model, [0, 0], [4, 25], 0)[0]).toBeCloseTo(37, 12);
    assertInDelta(zth(model, 0, 0, 0), 3, 1e-15, 'Zth(0)');
    const run = runProfile(model, { durations: [1, 2, 1], inputs: [4, 25, 9, 25, 2, 25] }, { watchNodes: [0] });
    assertInDelta(run.peaks[0].valueC, 25 + 9 * 3, 1e-12, 'peak');
    expect(run.peaks[0].timeS).toBe(1);
  });

  it('an empty network compiles and returns empty states', () => {
    const model = compileNetwork({ nodes: [], links: [], heatInputs: [] });
    expect(steadyState(model, [25]).length).toBe(0);
    expect(advance(model, [], [25], 3).length).toBe(0);
  });
});
