import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import type { InterfaceMaterial } from './types';

export const KIND_LABELS: Record<InterfaceMaterial['kind'], string> = {
  per_package: 'Per package',
  per_area: 'Per area',
};

/**
 * Resistance of one cm² of the layer, K·cm²/W: conduction through the thickness, t / k (plane
 * wall, R″ = L/k: Incropera & DeWitt, Fundamentals of Heat and Mass Transfer, eq. 3.6), plus
 * the contact resistance. t in mm and k in W/(m·K): t / k = t·10⁻³ / k m²·K/W = 10·t / k K·cm²/W.
 */
export function areaResistanceKCm2PerW(m: Pick<InterfaceMaterial, 'thicknessMm' | 'conductivityWPerMK' | 'contactKCm2PerW'>): number | null {
  if (m.thicknessMm === null || m.conductivityWPerMK === null) return null;
  return (10 * m.thicknessMm) / m.conductivityWPerMK + (m.contactKCm2PerW ?? 0);
}

/** The value a reader compares: Rθcs for a package, or resistance per cm² for an area material. */
export function formatInterfaceValue(m: InterfaceMaterial): string {
  if (m.kind === 'per_package') return m.rthKPerW === null ? '—' : `Rθcs ${formatQuantity(m.rthKPerW, 'K/W')}`;
  const r = areaResistanceKCm2PerW(m);
  return r === null ? '—' : `${formatQuantity(r, 'K·cm²/W')}`;
}

/** "1.5 W/(m·K), 0.25 mm, contact 0.1 K·cm²/W". */
export function formatBulk(m: InterfaceMaterial): string {
  const parts = [
    m.conductivityWPerMK === null ? null : formatQuantity(m.conductivityWPerMK, 'W/(m·K)'),
    m.thicknessMm === null ? null : formatQuantity(m.thicknessMm, 'mm'),
    m.contactKCm2PerW === null ? null : `contact ${formatNumber(m.contactKCm2PerW)}\u00a0K·cm²/W`,
  ].filter(Boolean);
  return parts.length ? parts.join(', ') : '—';
}
