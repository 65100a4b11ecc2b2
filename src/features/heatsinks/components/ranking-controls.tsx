import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Chip, Text, TextField, useIsWide } from '@/components/ui';
import { SORT_KEYS } from '@/core/heatsink';
import { spacing } from '@/constants/theme';
import { formatQuantity } from '@/features/studies/quantity-format';

import type { RankingDefaults, RankingFormCheck, RankingFormState } from '../ranking-form';
import { SORT_LABELS } from '../ranking-text';

export type RankingControlsProps = {
  form: RankingFormState;
  defaults: RankingDefaults;
  errors: RankingFormCheck['errors'];
  onChange: (next: RankingFormState) => void;
};

function ChoiceRow({ label, children }: { label: string; children: ReactNode }) {
  return (
    <View style={styles.choice}>
      <Text variant="label" tone="muted">
        {label}
      </Text>
      <View role="radiogroup" aria-label={label} style={styles.chips}>
        {children}
      </View>
    </View>
  );
}

/** The sink slot, the sort key and the what-ifs (air, ambient, margin) of a ranking. */
export function RankingControls({ form, defaults, errors, onChange }: RankingControlsProps) {
  const wide = useIsWide();
  const set = (patch: Partial<RankingFormState>) => onChange({ ...form, ...patch });
  return (
    <View style={styles.controls}>
      <View style={[styles.rows, wide && styles.rowsWide]}>
        {defaults.sinks.length > 1 ? (
          <ChoiceRow label="Sink slot">
            {defaults.sinks.map((s) => (
              <Chip
                key={s.id}
                label={s.name ? `${s.id}, ${s.name}` : s.id}
                selected={form.sink === s.id}
                onPress={() =>
                  set({ sink: s.id, ...(s.airSpeedMPerS === undefined ? {} : { air: 'moving', speedText: String(s.airSpeedMPerS) }) })
                }
              />
            ))}
          </ChoiceRow>
        ) : null}
        <ChoiceRow label="Sort by">
          {SORT_KEYS.map((k) => (
            <Chip key={k} label={SORT_LABELS[k]} selected={form.sort === k} onPress={() => set({ sort: k })} />
          ))}
        </ChoiceRow>
        <ChoiceRow label="Air">
          <Chip label="Still air" selected={form.air === 'still'} onPress={() => set({ air: 'still' })} />
          <Chip label="Moving air" selected={form.air === 'moving'} onPress={() => set({ air: 'moving', speedText: form.speedText || '1' })} />
        </ChoiceRow>
      </View>
      <View style={styles.fields}>
        {form.air === 'moving' ? (
          <View style={styles.field}>
            <TextField
              label="Air speed (m/s)"
              value={form.speedText}
              onChangeText={(t) => set({ speedText: t })}
              error={errors.speed}
              autoCapitalize="none"
              autoCorrect={false}
              inputMode="decimal"
            />
          </View>
        ) : null}
        <View style={styles.field}>
          <TextField
            label="Ambient (°C)"
            value={form.ambientText}
            onChangeText={(t) => set({ ambientText: t })}
            placeholder={defaults.ambientC === null ? 'study’s' : `study’s ${formatQuantity(defaults.ambientC, '°C')}`}
            error={errors.ambient}
            autoCapitalize="none"
            autoCorrect={false}
            inputMode="decimal"
          />
        </View>
        <View style={styles.field}>
          <TextField
            label="Margin (K)"
            value={form.marginText}
            onChangeText={(t) => set({ marginText: t })}
            placeholder={`study’s ${formatQuantity(defaults.marginK, 'K')}`}
            error={errors.margin}
            autoCapitalize="none"
            autoCorrect={false}
            inputMode="decimal"
          />
        </View>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  controls: { gap: spacing.md },
  rows: { gap: spacing.md },
  rowsWide: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.xl },
  choice: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  fields: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  field: { flexGrow: 1, flexBasis: 140, maxWidth: 220 },
});
