import type { RawDevice, RawObject } from './types';

/** A device's SOA model as the editor holds it (docs/study-format.md, `soa`). */
export type RawSoa = RawObject & { kind?: string; transistor?: string; tjMaxC?: unknown; zthJc?: unknown; linearMode?: unknown; notes?: unknown };

export type Transistor = 'bipolar' | 'darlington' | 'mosfet';

export const transistorOf = (t: unknown): Transistor => (t === 'darlington' || t === 'mosfet' ? t : 'bipolar');

/** Fields both kinds share: kept across a change of kind. */
const COMMON = ['transistor', 'tjMaxC', 'zthJc', 'linearMode', 'notes'] as const;

/**
 * A new SOA model for the device: its transistor kind and Tj,max from the device, the
 * datasheet values left empty so the problem list asks for them (nothing is made up).
 */
export function starterSoa(device: RawDevice, kind: 'parameters' | 'points'): RawSoa {
  const base: RawSoa = { kind, transistor: transistorOf(device.kind), tjMaxC: device.tjMaxC ?? '' };
  return kind === 'parameters' ? { ...base, icMaxA: '', vceoV: '', rthJcKPerW: '' } : { ...base, curves: [{ pulseS: 'dc', points: [{ vceV: '', icA: '' }] }] };
}

/** The model given the other way: the shared fields stay, the other kind's boundary starts empty. */
export function soaKindChange(soa: RawSoa | undefined, kind: 'parameters' | 'points'): RawSoa {
  const current = soa ?? {};
  if (current.kind === kind) return current;
  const kept = Object.fromEntries(COMMON.filter((k) => current[k] !== undefined).map((k) => [k, current[k]]));
  const fresh = starterSoa({ kind: transistorOf(current.transistor), tjMaxC: current.tjMaxC as RawDevice['tjMaxC'] }, kind);
  return { ...fresh, ...kept, kind };
}
