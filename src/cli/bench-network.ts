import { AMBIENT, type NetworkSpec } from '../core/thermal';

/**
 * The benchmark's 8-node network: two devices (junction, die attach, case) on one sink,
 * the sink in an enclosure. Invented values of a plausible TO-247 stage. Every node holds
 * a capacity, so all 8 are modes.
 */
export function benchNetwork(): { spec: NetworkSpec; junctions: number[] } {
  const device = (id: string, rIface: number) => [
    { a: `${id}.junction`, b: `${id}.attach`, rKPerW: 0.12 },
    { a: `${id}.attach`, b: `${id}.case`, rKPerW: 0.3 },
    { a: `${id}.case`, b: 'sink', rKPerW: rIface },
  ];
  const nodes = ['Q1', 'Q2'].flatMap((id) => [
    { id: `${id}.junction`, capacityJPerK: 0.02 },
    { id: `${id}.attach`, capacityJPerK: 0.4 },
    { id: `${id}.case`, capacityJPerK: 6 },
  ]);
  nodes.push({ id: 'sink', capacityJPerK: 800 }, { id: 'enclosure', capacityJPerK: 400 });
  const links = [...device('Q1', 0.15), ...device('Q2', 0.22), { a: 'sink', b: 'enclosure', rKPerW: 0.35 }, { a: 'enclosure', b: AMBIENT, rKPerW: 0.2 }];
  return { spec: { nodes, links, heatInputs: ['Q1.junction', 'Q2.junction'] }, junctions: [0, 3] };
}

/**
 * A deterministic pseudo-random profile (a linear congruential generator, Numerical Recipes'
 * constants): durations 1–100 ms and powers 0–60 W per device, every segment different, so
 * no input or duration repeats and the solver's caches cannot help.
 */
export function benchProfile(segments: number, seed = 12345): { durations: Float64Array; inputs: Float64Array } {
  let state = seed >>> 0;
  const next = () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 4294967296;
  };
  const durations = new Float64Array(segments);
  const inputs = new Float64Array(segments * 3);
  for (let s = 0; s < segments; s++) {
    durations[s] = 0.001 + 0.099 * next();
    inputs[s * 3] = 60 * next();
    inputs[s * 3 + 1] = 60 * next();
    inputs[s * 3 + 2] = 25;
  }
  return { durations, inputs };
}
