import type { NetworkSpec } from './types';

/**
 * Checks a network description; throws TypeError (wrong type) or RangeError (bad value)
 * whose message starts with the field path, e.g. `links[2].rKPerW`.
 */
export function validateNetwork(spec: NetworkSpec): void {
  throw new Error('not implemented yet');
}

/** Ids of nodes with no chain of links to the ambient (empty when the network is sound). */
export function nodesWithoutAmbientPath(spec: NetworkSpec): string[] {
  throw new Error('not implemented yet');
}
