import { checkCauerStages } from './check-package';
import type { CauerStage, LinkSpec, NodeSpec } from './types';

/**
 * Nodes and links of a Cauer ladder to splice into a network: node `${prefix}${k}` holds
 * stage k's capacity (k = 1 is the junction), stage k's resistance runs to node k + 1, and
 * the last one to `to` (a node id, e.g. the case, or AMBIENT).
 */
export function cauerNetwork(
  stages: readonly CauerStage[],
  prefix: string,
  to: string,
): { nodes: NodeSpec[]; links: LinkSpec[]; junctionId: string } {
  checkCauerStages(stages, 'stages');
  const ids = stages.map((_, k) => `${prefix}${k + 1}`);
  const nodes = stages.map((s, k) => ({ id: ids[k], capacityJPerK: s.capacityJPerK }));
  const links = stages.map((s, k) => ({ a: ids[k], b: k + 1 < ids.length ? ids[k + 1] : to, rKPerW: s.rKPerW }));
  return { nodes, links, junctionId: ids[0] };
}
