import { zthEquivalent } from '@/charts/zth-model';
import { fosterToCauer } from '@/core/thermal';

import { rthJcKPerW } from './part-format';
import type { ThermalValues } from './part-form-values';
import { readThermal } from './part-input';
import { fieldText } from './quantity-text';

// Six significant digits: the conversion is exact, its last digits are noise to a reader.
const six = (v: number) => Number(v.toPrecision(6));
const num = (v: number) => fieldText(six(v), 'number');
const time = (v: number) => fieldText(six(v), 'time');

/**
 * The thermal values in another form, converted when the current values read (the same Zth(t),
 * PHYSICS.md §3; to one Rθjc only the total survives), with a sentence saying what was done.
 * Rows that do not read are kept as typed in the form they were written in.
 */
export function switchThermalKind(t: ThermalValues, to: ThermalValues['kind']): { next: ThermalValues; note: string | null } {
  if (t.kind === to) return { next: t, note: null };
  const model = readThermal(t);
  const next: ThermalValues = { ...t, kind: to };
  if (!model) return { next, note: null };
  try {
    if (to === 'cauer' && model.kind === 'foster') {
      next.stages = fosterToCauer(model.terms).map((s) => ({ rKPerW: num(s.rKPerW), capacityJPerK: num(s.capacityJPerK) }));
      return { next, note: 'Converted from the Foster terms: the same Zth(t).' };
    }
    if (to === 'foster' && model.kind !== 'foster') {
      const eq = zthEquivalent(model);
      if (eq.instantKPerW === 0 && eq.terms.length > 0) {
        next.terms = eq.terms.map((x) => ({ rKPerW: num(x.rKPerW), tauS: time(x.tauS) }));
        return { next, note: model.kind === 'cauer' ? 'Converted from the Cauer stages: the same Zth(t).' : 'One term with τ = R·C.' };
      }
    }
    if (to === 'cauer' && model.kind === 'lumped') {
      next.stages = [{ rKPerW: num(model.rthKPerW), capacityJPerK: num(model.capacityJPerK ?? 0) }];
      return { next, note: 'One stage with the same R and C.' };
    }
  } catch {
    // Values the conversion refuses: the rows stay as they were.
  }
  if (to === 'lumped') {
    next.rthKPerW = num(rthJcKPerW(model));
    next.capacityJPerK = '';
    return { next, note: 'Rθjc is the sum of the resistances; the transient detail is dropped.' };
  }
  return { next, note: null };
}
