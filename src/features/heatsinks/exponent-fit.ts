import { convectionExponentFromRatings } from '@/core/heatsink';

type Typed = { rthKPerW: number | null; riseK: number | null };

export type ExponentFit =
  | { kind: 'empty' }
  | { kind: 'bad'; field: 'reference' | 'rthKPerW' | 'riseK'; message: string }
  | { kind: 'fit'; exponent: number; inRange: boolean };

const positive = (v: number | null) => v !== null && Number.isFinite(v) && v > 0;

/**
 * The exponent through the form's rating (at the reference rise) and a second one typed
 * beside it, or what is missing; inRange says whether the catalogue can take it (0…1).
 */
export function exponentFit(reference: Typed, second: Typed): ExponentFit {
  if (second.rthKPerW === null && second.riseK === null) return { kind: 'empty' };
  if (second.rthKPerW !== null && !positive(second.rthKPerW)) return { kind: 'bad', field: 'rthKPerW', message: 'Rθsa must be a number greater than 0' };
  if (second.riseK !== null && !positive(second.riseK)) return { kind: 'bad', field: 'riseK', message: 'The rise must be a number greater than 0' };
  if (second.rthKPerW === null || second.riseK === null) return { kind: 'empty' };
  if (!positive(reference.rthKPerW) || !positive(reference.riseK)) {
    return { kind: 'bad', field: 'reference', message: 'Give the still-air Rθsa and its reference rise above first.' };
  }
  if (second.riseK === reference.riseK) return { kind: 'bad', field: 'riseK', message: 'Needs a rise other than the reference rise' };
  const exponent = convectionExponentFromRatings({ rthKPerW: reference.rthKPerW!, riseK: reference.riseK! }, { rthKPerW: second.rthKPerW, riseK: second.riseK });
  return { kind: 'fit', exponent, inRange: exponent >= 0 && exponent <= 1 };
}
