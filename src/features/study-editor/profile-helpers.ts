import type { RawGroup, RawSegment } from './types';

/**
 * What a helper's levels set: the load current of an operating point (with Vin and Vout
 * held), or the power of one device's parts.
 */
export type LevelTarget =
  | { kind: 'current'; vinV?: number; voutV: number; railPlan: boolean }
  | { kind: 'power'; device: string };

function segmentAt(target: LevelTarget, durationS: number, level: number, label?: string): RawSegment {
  const segment: RawSegment = { durationS };
  if (label) segment.label = label;
  if (target.kind === 'power') {
    segment.powerW = { [target.device]: level };
    return segment;
  }
  if (!target.railPlan) segment.vinV = target.vinV;
  segment.voutV = target.voutV;
  segment.iloadA = level;
  return segment;
}

export type PulseTrain = { onLevel: number; offLevel: number; onS: number; offS: number; count: number };

/**
 * A pulse train as one group: an "on" and an "off" segment repeated `count` times in place,
 * the format's own way of writing pulse trains (docs/study-format.md, profile groups).
 */
export function pulseTrain(target: LevelTarget, p: PulseTrain): RawGroup {
  return {
    label: `pulse train, ${p.count} × (on ${p.onS} s, off ${p.offS} s)`,
    repeat: p.count,
    segments: [segmentAt(target, p.onS, p.onLevel, 'on'), segmentAt(target, p.offS, p.offLevel, 'off')],
  };
}

export type Ramp = { startLevel: number; endLevel: number; durationS: number; steps: number };

/**
 * A ramp as `steps` equal segments. Each holds the ramp's mean over its piece, as the solver
 * treats a linear ambient ramp (docs/study-format.md): 0 → 8 in 4 steps gives 1, 3, 5, 7.
 */
export function ramp(target: LevelTarget, p: Ramp): RawSegment[] {
  const stepS = p.durationS / p.steps;
  return Array.from({ length: p.steps }, (_, i) => {
    const level = p.startLevel + ((p.endLevel - p.startLevel) * (i + 0.5)) / p.steps;
    return segmentAt(target, stepS, Number(level.toPrecision(12)), `ramp ${i + 1}/${p.steps}`);
  });
}
