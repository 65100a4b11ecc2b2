import { memo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { cauerToFoster, fosterToCauer } from '@/core/thermal';
import { spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import { at } from '../field-path';
import type { RawDevice, RawPoint } from '../types';
import { ChoiceRow } from './choice-row';
import { PointList } from './point-list';
import { QuantityField } from './quantity-field';

type Package = NonNullable<RawDevice['package']>;
type Kind = 'foster' | 'cauer' | 'lumped';

const KINDS = [
  { value: 'foster', label: 'Foster terms' },
  { value: 'cauer', label: 'Cauer stages' },
  { value: 'lumped', label: 'One Rθjc' },
] as const;

const FOSTER_COLUMNS = [
  { key: 'rKPerW', label: 'R', kind: 'thermalResistance' },
  { key: 'tauS', label: 'τ', kind: 'time' },
] as const;
const CAUER_COLUMNS = [
  { key: 'rKPerW', label: 'R', kind: 'thermalResistance' },
  { key: 'capacityJPerK', label: 'C', kind: 'heatCapacity' },
] as const;

const numbers = (rows: RawPoint[] | undefined, keys: string[]): { [k: string]: number }[] | null =>
  rows && rows.length > 0 && rows.every((r) => keys.every((k) => typeof r[k] === 'number' && (r[k] as number) > 0))
    ? (rows as { [k: string]: number }[])
    : null;

// Six significant digits: the conversion is exact, its last digits are noise to a reader.
const round = (v: number) => Number(v.toPrecision(6));

/** The package in the other form, converted where the values allow (same Zth(t), PHYSICS.md §3). */
function convert(pkg: Package, to: Kind): { next: Package; note: string | null } {
  const terms = numbers(pkg.terms, ['rKPerW', 'tauS']);
  const stages = pkg.stages && pkg.stages.length > 0 && pkg.stages.every((s) => typeof s.rKPerW === 'number' && typeof s.capacityJPerK === 'number') ? (pkg.stages as { rKPerW: number; capacityJPerK: number }[]) : null;
  const total = pkg.kind === 'lumped' ? pkg.rthKPerW : (terms ?? stages)?.reduce((s, t) => s + t.rKPerW, 0);
  try {
    if (to === 'cauer' && pkg.kind === 'foster' && terms) {
      const ladder = fosterToCauer(terms.map((t) => ({ rKPerW: t.rKPerW, tauS: t.tauS })));
      return { next: { kind: 'cauer', stages: ladder.map((s) => ({ rKPerW: round(s.rKPerW), capacityJPerK: round(s.capacityJPerK) })) }, note: 'Converted from the Foster terms: the same Zth(t).' };
    }
    if (to === 'foster' && pkg.kind === 'cauer' && stages && stages.every((s) => s.capacityJPerK > 0)) {
      const set = cauerToFoster(stages);
      return { next: { kind: 'foster', terms: set.map((t) => ({ rKPerW: round(t.rKPerW), tauS: round(t.tauS) })) }, note: 'Converted from the Cauer stages: the same Zth(t).' };
    }
  } catch {
    // Values the conversion refuses: start the table afresh below.
  }
  const r = typeof total === 'number' ? round(total) : '';
  if (to === 'lumped') return { next: { kind: 'lumped', rthKPerW: r }, note: typeof total === 'number' ? 'Rθjc is the sum of the resistances; the transient detail is dropped.' : null };
  if (to === 'foster') return { next: { kind: 'foster', terms: [{ rKPerW: r, tauS: '' }] }, note: null };
  const c = pkg.kind === 'lumped' && typeof pkg.capacityJPerK === 'number' ? pkg.capacityJPerK : '';
  return { next: { kind: 'cauer', stages: [{ rKPerW: r, capacityJPerK: c }] }, note: null };
}

export type PackageFieldsProps = { field: string; pkg: Package | undefined; owner: string };

/** The junction-to-case model: Foster terms, a Cauer ladder or one Rθjc; switching converts. */
export const PackageFields = memo(function PackageFields({ field, pkg, owner }: PackageFieldsProps) {
  const { set } = useEditorActions();
  const kindError = useFieldError(at(field, 'kind'));
  const [note, setNote] = useState<string | null>(null);
  const current = pkg ?? { kind: 'lumped' };
  const kind = (['foster', 'cauer', 'lumped'].includes(String(current.kind)) ? current.kind : 'lumped') as Kind;
  const rows = (kind === 'foster' ? current.terms : kind === 'cauer' ? current.stages : undefined) ?? [];
  const total = kind === 'lumped' ? current.rthKPerW : rows.reduce<number | null>((s, t) => (s !== null && typeof t.rKPerW === 'number' ? s + t.rKPerW : null), 0);

  return (
    <View style={styles.box}>
      <ChoiceRow
        label="Junction to case"
        value={kind}
        options={KINDS}
        error={kindError}
        onChange={(to) => {
          if (to === kind) return;
          const { next, note: said } = convert(current, to);
          set(field, next);
          setNote(said);
        }}
      />
      {note ? (
        <Text variant="caption" tone="muted">
          {note}
        </Text>
      ) : null}
      {kind === 'foster' ? (
        <PointList field={at(field, 'terms')} points={current.terms} columns={FOSTER_COLUMNS} noun="term" minRows={1} owner={owner} />
      ) : null}
      {kind === 'cauer' ? (
        <PointList field={at(field, 'stages')} points={current.stages} columns={CAUER_COLUMNS} noun="stage" minRows={1} owner={owner} title="Junction first" />
      ) : null}
      {kind === 'lumped' ? (
        <View style={styles.row}>
          <QuantityField field={at(field, 'rthKPerW')} value={current.rthKPerW} kind="thermalResistance" label="Rθjc" fullLabel={`${owner} Rθjc`} />
          <QuantityField
            field={at(field, 'capacityJPerK')}
            value={current.capacityJPerK}
            kind="heatCapacity"
            label="Capacity at junction"
            fullLabel={`${owner} junction capacity`}
            optional
          />
        </View>
      ) : null}
      {kind !== 'lumped' && typeof total === 'number' ? (
        <Text variant="caption" tone="faint">
          Rθjc in steady state: {round(total)} K/W
        </Text>
      ) : null}
    </View>
  );
});

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
});
