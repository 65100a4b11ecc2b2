import type { CauerStage, LinkSpec, NodeSpec } from './types';

/**
 * Nodes and links of a Cauer ladder: node `${prefix}${k}` for stage k (1-based, junction
 * first), the last stage's resistance ending at `to` (a node id or AMBIENT).
 */
export function cauerNetwork(stages: readonly CauerStage[], prefix: string, to: string): { nodes: NodeSpec[]; links: LinkSpec[]; junctionId: string } {
  throw new Error('not implemented yet');
}
