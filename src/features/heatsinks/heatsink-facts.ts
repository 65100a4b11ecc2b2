import type { Fact } from '@/features/studies/document-facts';
import { formatQuantity } from '@/features/studies/quantity-format';

import { formatExponent, formatMass, formatPrice, formatRth, formatSize } from './heatsink-format';
import type { Heatsink } from './types';

/** The label/value pairs of a heatsink's detail page. */
export function heatsinkFacts(h: Heatsink): Fact[] {
  return [
    { label: 'Rθsa in still air', value: formatRth(h) },
    { label: 'Convection exponent n', value: formatExponent(h.convectionExponent) },
    { label: 'Mass', value: formatMass(h.massKg) },
    { label: 'Material', value: h.material ?? '—' },
    { label: 'Heat capacity', value: h.capacityJPerK === null ? '—' : formatQuantity(h.capacityJPerK, 'J/K') },
    { label: 'Size W × L × H', value: formatSize(h) },
    { label: 'Devices per sink', value: String(h.devicesPerSink) },
    { label: 'Price', value: formatPrice(h.price) },
  ];
}
