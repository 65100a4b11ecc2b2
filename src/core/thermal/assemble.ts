import { AMBIENT, type NetworkSpec } from './types';

/** Dense C, G, B of C dT/dt = −G T + B u (row-major), for a validated network. */
export type AssembledNetwork = {
  nodeCount: number;
  inputCount: number;
  capacity: Float64Array;
  conductance: Float64Array;
  input: Float64Array;
  nodeIndex: Map<string, number>;
};

export function assembleNetwork(spec: NetworkSpec): AssembledNetwork {
  const N = spec.nodes.length;
  const q = spec.heatInputs.length + 1;
  const nodeIndex = new Map<string, number>();
  spec.nodes.forEach((node, i) => nodeIndex.set(node.id, i));
  const capacity = Float64Array.from(spec.nodes, (node) => node.capacityJPerK);
  const conductance = new Float64Array(N * N);
  const input = new Float64Array(N * q);
  for (const link of spec.links) {
    const g = 1 / link.rKPerW;
    const a = link.a === AMBIENT ? -1 : (nodeIndex.get(link.a) as number);
    const b = link.b === AMBIENT ? -1 : (nodeIndex.get(link.b) as number);
    if (a >= 0) conductance[a * N + a] += g;
    if (b >= 0) conductance[b * N + b] += g;
    if (a >= 0 && b >= 0) {
      conductance[a * N + b] -= g;
      conductance[b * N + a] -= g;
    }
    // A link to the ambient feeds Ta (the last input) into the node.
    if (a < 0) input[b * q + q - 1] += g;
    if (b < 0) input[a * q + q - 1] += g;
  }
  spec.heatInputs.forEach((id, k) => {
    input[(nodeIndex.get(id) as number) * q + k] += 1;
  });
  return { nodeCount: N, inputCount: q, capacity, conductance, input, nodeIndex };
}
