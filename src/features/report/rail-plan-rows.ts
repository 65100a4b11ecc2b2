import type { TapCircuit } from '@/core/rails';
import type { StudyRailPlan } from '@/core/study';
import type { Fact } from '@/features/studies/document-facts';
import { formatQuantity } from '@/features/studies/quantity-format';

function pathParts(node: TapCircuit): string {
  const parts: string[] = [];
  if (node.diodeV) parts.push(`diode ${formatQuantity(node.diodeV, 'V')}`);
  if (node.ballastOhm) parts.push(`ballast ${formatQuantity(node.ballastOhm, 'Ω')}`);
  return parts.length ? ` (${parts.join(', ')})` : '';
}

/** A tap's circuit in one line: "A1 + A2" in series, "A1 ∥ A2" in parallel, with diodes and ballast. */
export function circuitText(node: TapCircuit): string {
  if (node.kind === 'source') return `${node.source}${pathParts(node)}`;
  const inner =
    node.kind === 'series'
      ? node.parts.map(circuitText).join(' + ')
      : `${node.branches.map(circuitText).join(' ∥ ')}${node.mismatchV ? `, mismatch ${formatQuantity(node.mismatchV, 'V')}` : ''}`;
  return `[${inner}]${pathParts(node)}`;
}

export function railPlanFacts(plan: StudyRailPlan): Fact[] {
  const facts: Fact[] = [
    { label: 'Feeds', value: plan.device },
    { label: 'Sensed voltage', value: plan.sensed === 'output' ? 'the output reached' : 'the set point' },
    { label: 'Thresholds', value: plan.thresholdsV.length ? plan.thresholdsV.map((v) => formatQuantity(v, 'V')).join(', ') : 'none (one tap)' },
    { label: 'Hysteresis', value: formatQuantity(plan.hysteresisV, 'V') },
    {
      label: 'Map range',
      value: `${formatQuantity(plan.map.voutMinV, 'V')} to ${formatQuantity(plan.map.voutMaxV, 'V')}, up to ${formatQuantity(plan.map.ioutMaxA, 'A')}`,
    },
  ];
  if (plan.relay) {
    facts.push({
      label: 'Relay',
      value: `break ${formatQuantity(plan.relay.breakTimeS * 1000, 'ms')}, input capacitor ${formatQuantity(plan.relay.inputCapacitanceF * 1e6, 'µF')}`,
    });
  }
  return facts;
}
