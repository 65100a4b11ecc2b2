import type { CauerStage, FosterTerm } from './types';

/** Foster set (ascending τ) with the same Zth(t) as the Cauer ladder (junction first). */
export function cauerToFoster(stages: readonly CauerStage[]): FosterTerm[] {
  throw new Error('not implemented yet');
}
