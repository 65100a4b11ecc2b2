import type { ThermalModel } from '@/charts/zth-model';
import type { PulseWidth } from '@/core/soa';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import type { PartKind } from './types';

export const KIND_LABEL: Record<PartKind, string> = {
  regulator: 'Regulator',
  bipolar: 'Bipolar',
  darlington: 'Darlington',
  mosfet: 'MOSFET',
};

/** Rθjc of a package model: the sum of its series resistances, K/W. */
export function rthJcKPerW(model: ThermalModel): number {
  if (model.kind === 'lumped') return model.rthKPerW;
  const list = model.kind === 'foster' ? model.terms : model.stages;
  return list.reduce((sum, t) => sum + t.rKPerW, 0);
}

/** "Foster, 4 terms", "Cauer, 3 stages", "One Rθjc". */
export function thermalLabel(model: ThermalModel): string {
  if (model.kind === 'foster') return `Foster, ${model.terms.length} ${model.terms.length === 1 ? 'term' : 'terms'}`;
  if (model.kind === 'cauer') return `Cauer, ${model.stages.length} ${model.stages.length === 1 ? 'stage' : 'stages'}`;
  return (model.capacityJPerK ?? 0) > 0 ? 'One Rθjc with a capacity' : 'One Rθjc';
}

const PREFIXED = [
  { factor: 1, symbol: '' },
  { factor: 1e-3, symbol: 'm' },
  { factor: 1e-6, symbol: 'µ' },
  { factor: 1e-9, symbol: 'n' },
];

/** A value with an SI prefix that keeps it at 1 or more: "2.5 ms", "500 mA", "12 V". */
export function formatPrefixed(value: number, unit: string): string {
  if (value === 0 || !Number.isFinite(value)) return formatQuantity(value, unit);
  if (Math.abs(value) >= 1) return formatQuantity(value, unit);
  const p = PREFIXED.find((q) => Math.abs(value) >= q.factor * (1 - 1e-9)) ?? PREFIXED[PREFIXED.length - 1];
  return formatQuantity(value / p.factor, `${p.symbol}${unit}`);
}

export const formatTime = (s: number) => formatPrefixed(s, 's');

/** "DC" or a pulse width: "1 ms pulse". */
export const formatPulse = (p: PulseWidth) => (p === 'dc' ? 'DC' : `${formatTime(p)} pulse`);

export const formatPercent = (fraction: number) => `${formatNumber(fraction * 100)}\u00a0%`;
