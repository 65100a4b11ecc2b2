import { checkArray, checkNumber } from './check';
import { currentAt, isStrictlyDecreasing, parallelOf, seriesOf, thevenin, voltageAt, withPath } from './characteristic';
import type { Characteristic, CompiledTap, RailModel, RailPlan, RailSource, TapCircuit } from './types';

type Node = { char: Characteristic; capA: number; by: string };

/**
 * Checks a rail plan and works out each tap's voltage-current curve and capability
 * (PHYSICS.md §2). Bad input throws an error naming the field and the reason.
 */
export function compileRailPlan(plan: RailPlan): RailModel {
  if (plan == null || typeof plan !== 'object') throw new TypeError('plan: expected a rail plan');
  const sources = new Map<string, RailSource>();
  checkArray(plan.sources, 'plan.sources', 1).forEach((raw, k) => {
    const s = raw as RailSource;
    const p = `plan.sources[${k}]`;
    if (typeof s?.id !== 'string' || s.id === '') throw new TypeError(`${p}.id: expected a name`);
    if (sources.has(s.id)) throw new RangeError(`${p}.id: "${s.id}" is used twice`);
    checkNumber(s.vocV, `${p}.vocV`, 0, true);
    checkNumber(s.rsOhm, `${p}.rsOhm`, 0);
    checkNumber(s.imaxA, `${p}.imaxA`, 0, true);
    sources.set(s.id, s);
  });
  const taps = checkArray(plan.taps, 'plan.taps', 1).map((raw, k): CompiledTap => {
    const tap = raw as RailPlan['taps'][number];
    const p = `plan.taps[${k}]`;
    if (typeof tap?.name !== 'string') throw new TypeError(`${p}.name: expected a name`);
    const nominal = compileNode(tap.circuit, sources, `${p}.circuit`, new Set(), true);
    const matched = compileNode(tap.circuit, sources, `${p}.circuit`, new Set(), false);
    return {
      name: tap.name,
      characteristic: nominal.char,
      capabilityA: nominal.capA,
      limitedBy: nominal.by,
      shareErrorA: Math.max(0, matched.capA - nominal.capA),
    };
  });
  for (let k = 1; k < taps.length; k++) {
    if (voltageAt(taps[k].characteristic, 0) < voltageAt(taps[k - 1].characteristic, 0)) {
      throw new RangeError(`plan.taps[${k}]: its open-circuit voltage lies below tap ${k - 1}'s; order the taps from the lowest voltage up`);
    }
  }
  checkThresholds(plan, taps.length);
  if (plan.sensed !== 'output' && plan.sensed !== 'set-point') throw new RangeError('plan.sensed: must be "output" or "set-point"');
  return { plan, taps };
}

export function checkThresholds(t: { thresholdsV: readonly number[]; hysteresisV: number }, tapCount: number, path = 'plan'): void {
  checkNumber(t.hysteresisV, `${path}.hysteresisV`, 0);
  const th = checkArray(t.thresholdsV, `${path}.thresholdsV`);
  if (th.length !== tapCount - 1) {
    throw new RangeError(`${path}.thresholdsV: ${tapCount} taps need ${tapCount - 1} thresholds, got ${th.length}`);
  }
  th.forEach((v, k) => {
    checkNumber(v, `${path}.thresholdsV[${k}]`);
    if (k > 0 && !((v as number) - t.hysteresisV > (th[k - 1] as number))) {
      throw new RangeError(`${path}.thresholdsV[${k}]: must lie more than the hysteresis above the one before`);
    }
  });
}

function compileNode(node: TapCircuit, sources: Map<string, RailSource>, path: string, used: Set<string>, mismatch: boolean): Node {
  if (node == null || typeof node !== 'object') throw new TypeError(`${path}: expected a circuit node`);
  if (node.diodeV !== undefined) checkNumber(node.diodeV, `${path}.diodeV`, 0);
  if (node.ballastOhm !== undefined) checkNumber(node.ballastOhm, `${path}.ballastOhm`, 0);
  const wrap = (n: Node): Node => ({ ...n, char: withPath(n.char, node.diodeV, node.ballastOhm) });
  if (node.kind === 'source') {
    const s = sources.get(node.source);
    if (!s) throw new RangeError(`${path}.source: no source named "${String(node.source)}"`);
    if (used.has(s.id)) throw new RangeError(`${path}.source: "${s.id}" appears twice in one tap`);
    used.add(s.id);
    return wrap({ char: thevenin(s.vocV, s.rsOhm), capA: s.imaxA, by: s.id });
  }
  if (node.kind === 'series') {
    const parts = checkArray(node.parts, `${path}.parts`, 1).map((c, j) =>
      compileNode(c as TapCircuit, sources, `${path}.parts[${j}]`, used, mismatch),
    );
    const weakest = parts.reduce((a, b) => (b.capA < a.capA ? b : a));
    return wrap({ char: seriesOf(parts.map((q) => q.char)), capA: weakest.capA, by: weakest.by });
  }
  if (node.kind === 'parallel') {
    const branches = checkArray(node.branches, `${path}.branches`, 1).map((c, j) =>
      compileNode(c as TapCircuit, sources, `${path}.branches[${j}]`, used, mismatch),
    );
    const dv = node.mismatchV === undefined ? 0 : checkNumber(node.mismatchV, `${path}.mismatchV`, 0);
    if (branches.length > 1) {
      branches.forEach((b, j) => {
        if (!isStrictlyDecreasing(b.char)) {
          throw new RangeError(`${path}.branches[${j}]: needs a resistance (rsOhm or ballastOhm > 0) to share the current`);
        }
      });
    }
    return wrap({ char: parallelOf(branches.map((b) => b.char)), ...parallelCapability(branches, mismatch ? dv : 0) });
  }
  throw new RangeError(`${path}.kind: must be "source", "series" or "parallel"`);
}

/**
 * Current at which the first branch reaches its rating, with that branch's voltage raised
 * by the mismatch (the worst case of the spread): it takes I/n plus the share error.
 */
function parallelCapability(branches: readonly Node[], mismatchV: number): { capA: number; by: string } {
  if (branches.length === 1) return { capA: branches[0].capA, by: branches[0].by };
  let best = { capA: Infinity, by: branches[0].by };
  branches.forEach((b, j) => {
    const common = voltageAt(b.char, b.capA) + mismatchV;
    let total = b.capA;
    branches.forEach((o, k) => {
      if (k !== j) total += currentAt(o.char, common);
    });
    if (total < best.capA) best = { capA: total, by: b.by };
  });
  return best;
}
