import { checkNumber } from './check';

export type SinkSizing = { ambientC: number; tjTargetC: number; rthJcKPerW: number; rthCsKPerW: number };

/**
 * Required sink-to-ambient resistance for one device, K/W (PHYSICS.md §5):
 * Rsa = (Tj,target − Ta)/P − Rjc − Rcs. Not feasible when no sink could do it (≤ 0).
 */
export function requiredSinkRth(powerW: number, s: SinkSizing): { rsaKPerW: number; feasible: boolean } {
  const p = checkNumber(powerW, 'powerW', 0);
  checkNumber(s?.ambientC, 'sink.ambientC');
  checkNumber(s.tjTargetC, 'sink.tjTargetC');
  checkNumber(s.rthJcKPerW, 'sink.rthJcKPerW', 0);
  checkNumber(s.rthCsKPerW, 'sink.rthCsKPerW', 0);
  const rise = s.tjTargetC - s.ambientC;
  if (p === 0) return { rsaKPerW: rise >= 0 ? Infinity : -Infinity, feasible: rise >= 0 };
  const rsa = rise / p - s.rthJcKPerW - s.rthCsKPerW;
  return { rsaKPerW: rsa, feasible: rsa > 0 };
}
