import { checkNumber } from './check';
import { voltageAt } from './characteristic';
import type { CompiledTap, RailModel, TapCapability } from './types';

function tapOf(model: RailModel, tapIndex: number): CompiledTap {
  if (!Number.isInteger(tapIndex) || tapIndex < 0 || tapIndex >= model.taps.length) {
    throw new RangeError(`tapIndex: must be a whole number from 0 to ${model.taps.length - 1}, got ${tapIndex}`);
  }
  return model.taps[tapIndex];
}

/**
 * Voltage a tap delivers to the element's input at load current I, V (PHYSICS.md §2): in
 * series the source voltages and resistances add; in parallel with ballast Rb, n equal
 * branches give Voc − I (Rs + Rb)/n, less the diode drop.
 */
export function tapVoltage(model: RailModel, tapIndex: number, currentA: number): number {
  checkNumber(currentA, 'currentA', 0);
  return voltageAt(tapOf(model, tapIndex).characteristic, currentA);
}

/** Current a tap can supply before a source passes its rating, A, with the share error of parallel branches. */
export function tapCapability(model: RailModel, tapIndex: number): TapCapability {
  const { capabilityA, limitedBy, shareErrorA } = tapOf(model, tapIndex);
  return { capabilityA, limitedBy, shareErrorA };
}
