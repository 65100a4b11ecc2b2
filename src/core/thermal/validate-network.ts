import { checkNumber, describe } from './check-input';
import { AMBIENT, type NetworkSpec } from './types';

/**
 * Checks a network description; throws TypeError (wrong type) or RangeError (bad value)
 * whose message starts with the field path, e.g. `links[2].rKPerW`. Every node must reach
 * the ambient through links, or its temperature would be undetermined.
 */
export function validateNetwork(spec: NetworkSpec): void {
  if (spec == null || typeof spec !== 'object') throw new TypeError(`network: expected an object, got ${describe(spec)}`);
  for (const key of ['nodes', 'links', 'heatInputs'] as const) {
    if (!Array.isArray(spec[key])) throw new TypeError(`${key}: expected an array, got ${describe(spec[key])}`);
  }
  const seen = new Map<string, number>();
  spec.nodes.forEach((node, i) => {
    if (node == null || typeof node !== 'object') throw new TypeError(`nodes[${i}]: expected an object, got ${describe(node)}`);
    if (typeof node.id !== 'string' || node.id === '') throw new TypeError(`nodes[${i}].id: expected a non-empty string, got ${describe(node.id)}`);
    if (node.id === AMBIENT) throw new RangeError(`nodes[${i}].id: "${AMBIENT}" is reserved for the ambient`);
    const first = seen.get(node.id);
    if (first !== undefined) throw new RangeError(`nodes[${i}].id: duplicate id "${node.id}" (also nodes[${first}])`);
    seen.set(node.id, i);
    checkNumber(node.capacityJPerK, `nodes[${i}].capacityJPerK`, 0);
  });
  spec.links.forEach((link, i) => {
    if (link == null || typeof link !== 'object') throw new TypeError(`links[${i}]: expected an object, got ${describe(link)}`);
    for (const end of ['a', 'b'] as const) {
      const id = link[end];
      if (typeof id !== 'string') throw new TypeError(`links[${i}].${end}: expected a node id, got ${describe(id)}`);
      if (id !== AMBIENT && !seen.has(id)) throw new RangeError(`links[${i}].${end}: unknown node "${id}"`);
    }
    if (link.a === link.b) throw new RangeError(`links[${i}].b: a link cannot join "${link.a}" to itself`);
    checkNumber(link.rKPerW, `links[${i}].rKPerW`, 0, true);
  });
  spec.heatInputs.forEach((id, k) => {
    if (typeof id !== 'string') throw new TypeError(`heatInputs[${k}]: expected a node id, got ${describe(id)}`);
    if (!seen.has(id)) throw new RangeError(`heatInputs[${k}]: unknown node "${id}"`);
  });
  const stranded = nodesWithoutAmbientPath(spec);
  if (stranded.length > 0) {
    const i = seen.get(stranded[0]);
    throw new RangeError(`nodes[${i}]: node "${stranded[0]}" has no path to ${AMBIENT}` +
      (stranded.length > 1 ? ` (nor ${stranded.length - 1} other node(s))` : ''));
  }
}

/**
 * Ids of nodes with no chain of links to the ambient, in node order (empty when every node
 * has one). Links naming unknown nodes are ignored. A condition check: compileNetwork
 * fails on exactly these networks.
 */
export function nodesWithoutAmbientPath(spec: NetworkSpec): string[] {
  const neighbours = new Map<string, string[]>([[AMBIENT, []]]);
  for (const node of spec.nodes) neighbours.set(node.id, []);
  for (const link of spec.links) {
    const a = neighbours.get(link.a);
    const b = neighbours.get(link.b);
    if (a && b) {
      a.push(link.b);
      b.push(link.a);
    }
  }
  const reached = new Set<string>([AMBIENT]);
  const queue = [AMBIENT];
  while (queue.length > 0) {
    for (const next of neighbours.get(queue.pop() as string) ?? []) {
      if (!reached.has(next)) {
        reached.add(next);
        queue.push(next);
      }
    }
  }
  return spec.nodes.map((n) => n.id).filter((id) => !reached.has(id));
}
