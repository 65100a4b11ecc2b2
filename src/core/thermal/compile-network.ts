import type { ModalModel, NetworkSpec } from './types';

/**
 * Compiles a network into modal form: assembles C, G, B, condenses massless nodes and
 * diagonalises S = C^(−1/2) G C^(−1/2). Throws like validateNetwork, and RangeError when
 * the network is too stiff to resolve (λmax/λmin > STIFFNESS_LIMIT).
 */
export function compileNetwork(spec: NetworkSpec): ModalModel {
  throw new Error('not implemented yet');
}
