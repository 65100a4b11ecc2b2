import { checkNumber, describe } from './check-input';
import type { CauerStage, FosterTerm } from './types';

/** What checkNumber(v, path, 0, true) accepts: a finite number above 0. */
const positiveFinite = (v: unknown): boolean => typeof v === 'number' && v > 0 && v < Infinity;

/** Throws unless terms is a non-empty array of { rKPerW > 0, tauS > 0 }. */
export function checkFosterTerms(terms: readonly FosterTerm[], path: string): void {
  if (!Array.isArray(terms)) throw new TypeError(`${path}: expected an array, got ${describe(terms)}`);
  if (terms.length === 0) throw new RangeError(`${path}: at least one term is required`);
  for (let i = 0; i < terms.length; i++) {
    const term = terms[i];
    // The field paths are built only for a term that fails (this runs per SOA point).
    if (term != null && typeof term === 'object' && positiveFinite(term.rKPerW) && positiveFinite(term.tauS)) continue;
    if (term == null || typeof term !== 'object') throw new TypeError(`${path}[${i}]: expected an object, got ${describe(term)}`);
    checkNumber(term.rKPerW, `${path}[${i}].rKPerW`, 0, true);
    checkNumber(term.tauS, `${path}[${i}].tauS`, 0, true);
  }
}

/** Throws unless stages is a non-empty array of { rKPerW > 0, capacityJPerK > 0 }. */
export function checkCauerStages(stages: readonly CauerStage[], path: string): void {
  if (!Array.isArray(stages)) throw new TypeError(`${path}: expected an array, got ${describe(stages)}`);
  if (stages.length === 0) throw new RangeError(`${path}: at least one stage is required`);
  for (let i = 0; i < stages.length; i++) {
    const stage = stages[i];
    if (stage != null && typeof stage === 'object' && positiveFinite(stage.rKPerW) && positiveFinite(stage.capacityJPerK)) continue;
    if (stage == null || typeof stage !== 'object') throw new TypeError(`${path}[${i}]: expected an object, got ${describe(stage)}`);
    checkNumber(stage.rKPerW, `${path}[${i}].rKPerW`, 0, true);
    checkNumber(stage.capacityJPerK, `${path}[${i}].capacityJPerK`, 0, true);
  }
}
