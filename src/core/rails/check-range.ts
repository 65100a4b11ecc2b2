import { checkNumber } from './check';
import type { OutputRange } from './types';

export function checkRange(r: OutputRange, path = 'range'): void {
  if (r == null || typeof r !== 'object') throw new TypeError(`${path}: expected { voutMinV, voutMaxV, ioutMaxA }`);
  checkNumber(r.voutMinV, `${path}.voutMinV`, 0);
  checkNumber(r.voutMaxV, `${path}.voutMaxV`, r.voutMinV, true);
  checkNumber(r.ioutMaxA, `${path}.ioutMaxA`, 0, true);
}
