import type { CauerStage, FosterTerm } from './types';

/** Cauer ladder (junction first) with the same Zth(t) as the Foster set. */
export function fosterToCauer(terms: readonly FosterTerm[]): CauerStage[] {
  throw new Error('not implemented yet');
}
