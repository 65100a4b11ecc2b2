import { AMBIENT, fosterToCauer, type CauerStage, type LinkSpec, type NetworkSpec, type NodeSpec } from '../thermal';
import type { Device, PackageModel, StudyDocument } from './types';

/** Node ids of the study network; charts and CSV columns are named after them. */
export const caseNodeId = (deviceId: string) => `${deviceId}.case`;
export const sinkNodeId = (sinkId: string) => `${sinkId}.sink`;
export const ENCLOSURE_NODE_ID = 'enclosure.air';

/** Package stages junction → case; a Foster set becomes its equivalent Cauer ladder (PHYSICS.md §3). */
export function packageStages(model: PackageModel): CauerStage[] {
  if (model.kind === 'cauer') return model.stages;
  if (model.kind === 'foster') return fosterToCauer(model.terms);
  return [{ rKPerW: model.rthKPerW, capacityJPerK: model.capacityJPerK }];
}

/**
 * `count` identical parts on one sink stay at one temperature by symmetry, so they act as
 * one part with R/count, C·count carrying count × the power of one part.
 */
function deviceChain(device: Device, stages: CauerStage[], sinkNode: string): { nodes: NodeSpec[]; links: LinkSpec[]; junction: string } {
  const n = device.count;
  const scaled = stages.map((s) => ({ rKPerW: s.rKPerW / n, capacityJPerK: s.capacityJPerK * n }));
  const caseId = caseNodeId(device.id);
  // Built here rather than with cauerNetwork, which refuses massless stages (a lumped Rθjc has none).
  const ids = scaled.map((_, k) => `${device.id}.stage${k + 1}`);
  const nodes: NodeSpec[] = scaled.map((s, k) => ({ id: ids[k], capacityJPerK: s.capacityJPerK }));
  const links: LinkSpec[] = scaled.map((s, k) => ({ a: ids[k], b: k + 1 < ids.length ? ids[k + 1] : caseId, rKPerW: s.rKPerW }));
  nodes.push({ id: caseId, capacityJPerK: 0 });
  links.push({ a: caseId, b: sinkNode, rKPerW: device.interfaceRthKPerW / n });
  return { nodes, links, junction: ids[0] };
}

export type StudyNetwork = {
  spec: NetworkSpec;
  /** Junction node id of each device, in device order (= heat input order). */
  junctions: string[];
};

/** Target node of a sink's Rθsa. */
export function sinkTargetNode(to: string): string {
  if (to === 'ambient') return AMBIENT;
  if (to === 'enclosure') return ENCLOSURE_NODE_ID;
  return sinkNodeId(to);
}

/**
 * The thermal network of a study: junction → package stages → case → interface → sink →
 * [enclosure] → ambient, with sink Rθsa taken from `rsa` (one per sink, in sink order) so
 * non-linear sinks can be re-linearised. `stages` holds the package ladders, in device order.
 */
export function buildStudyNetwork(doc: StudyDocument, stages: CauerStage[][], rsa: ArrayLike<number>): StudyNetwork {
  const nodes: NodeSpec[] = [];
  const links: LinkSpec[] = [];
  const junctions: string[] = [];
  doc.devices.forEach((device, i) => {
    const chain = deviceChain(device, stages[i], sinkNodeId(device.sink));
    nodes.push(...chain.nodes);
    links.push(...chain.links);
    junctions.push(chain.junction);
  });
  doc.sinks.forEach((sink, i) => {
    nodes.push({ id: sinkNodeId(sink.id), capacityJPerK: sink.capacityJPerK });
    links.push({ a: sinkNodeId(sink.id), b: sinkTargetNode(sink.to), rKPerW: rsa[i] });
  });
  if (doc.enclosure) {
    nodes.push({ id: ENCLOSURE_NODE_ID, capacityJPerK: doc.enclosure.capacityJPerK });
    links.push({ a: ENCLOSURE_NODE_ID, b: AMBIENT, rKPerW: doc.enclosure.rthKPerW });
  }
  return { spec: { nodes, links, heatInputs: junctions }, junctions };
}
