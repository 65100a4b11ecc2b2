import { checkNumber } from './check';
import type { RailPlan } from './types';

export type Relay = { inputCapacitanceF: number; breakTimeS: number };

export type ChatterCheck = {
  /** Droop of the element's input while the relay is open, ΔV ≈ I·tbreak/Cin, V. */
  droopV: number;
  hysteresisV: number;
  /** Load current above which the droop exceeds the hysteresis, A. */
  chatterAboveA: number;
  chatters: boolean;
  message?: string;
};

/**
 * Break-before-make tap change (PHYSICS.md §2): the input capacitor alone feeds the load for
 * tbreak and droops by I·tbreak/Cin. When the comparator senses the loaded output and that
 * droop exceeds the hysteresis, the output dip can send the selection back: chatter. Treating
 * the whole droop as output dip ignores the headroom left at the switching point, so the
 * warning errs on the safe side.
 */
export function checkChatter(plan: Pick<RailPlan, 'hysteresisV' | 'sensed'>, relay: Relay, currentA: number): ChatterCheck {
  const c = checkNumber(relay?.inputCapacitanceF, 'relay.inputCapacitanceF', 0, true);
  const t = checkNumber(relay.breakTimeS, 'relay.breakTimeS', 0);
  checkNumber(currentA, 'currentA', 0);
  const h = checkNumber(plan.hysteresisV, 'plan.hysteresisV', 0);
  const droopV = (currentA * t) / c;
  const chatterAboveA = t > 0 ? (h * c) / t : Infinity;
  const chatters = plan.sensed === 'output' && droopV > h;
  const result: ChatterCheck = { droopV, hysteresisV: h, chatterAboveA, chatters };
  if (chatters) {
    result.message =
      `Tap changes can chatter above ${chatterAboveA.toPrecision(3)} A: the input droops ${droopV.toPrecision(3)} V ` +
      `while the relay is open, more than the ${h} V hysteresis, and the comparator senses the loaded output. ` +
      'Sense the set point or a rail that is always powered, raise the input capacitance or the hysteresis, ' +
      'or use a relay that makes before it breaks.';
  }
  return result;
}
