import { BURN_CAUTION_C } from './constants';

export type TouchMaterial = 'metal' | 'glass' | 'plastic' | 'wood';
export type TouchContact = 'brief' | 'short' | 'long' | 'continuous';
export const TOUCH_MATERIALS: readonly TouchMaterial[] = ['metal', 'glass', 'plastic', 'wood'];
/** brief: up to 10 s; short: up to 1 min; long: up to 8 h; continuous: beyond 8 h. */
export const TOUCH_CONTACTS: readonly TouchContact[] = ['brief', 'short', 'long', 'continuous'];

/**
 * Touch-temperature limits of accessible parts by material and contact time, °C, after the
 * table of touch temperature limits in IEC 62368-1 (class TS1). From memory, without the
 * standard at hand, and rounded down where unsure: check them against the edition that
 * applies to the product. Bare heatsinks are metal.
 */
export const TOUCH_LIMITS_C: Record<TouchMaterial, Record<TouchContact, number>> = {
  metal: { brief: 60, short: 51, long: 48, continuous: 43 },
  glass: { brief: 70, short: 56, long: 48, continuous: 43 },
  plastic: { brief: 85, short: 60, long: 48, continuous: 43 },
  wood: { brief: 85, short: 60, long: 48, continuous: 43 },
};

export type TouchVerdict = {
  peakC: number;
  limitC: number;
  /** limit − peak, K (negative when the limit is exceeded). */
  marginK: number;
  passed: boolean;
  /** The surface passes BURN_CAUTION_C (common practice), whatever the limit. */
  burnCaution: boolean;
};

export function touchLimitC(material: TouchMaterial, contact: TouchContact): number {
  return TOUCH_LIMITS_C[material][contact];
}

/** Peak surface temperature against a touch limit; reaching the limit fails. */
export function checkTouch(peakC: number, limitC: number): TouchVerdict {
  return { peakC, limitC, marginK: limitC - peakC, passed: peakC < limitC, burnCaution: peakC >= BURN_CAUTION_C };
}
