import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { useEditorActions, useFieldError } from '../editor-context';
import type { RawAmbient } from '../types';
import { ChoiceRow } from './choice-row';
import { PointList } from './point-list';
import { QuantityField } from './quantity-field';

const KINDS = [
  { value: 'constant', label: 'Constant' },
  { value: 'profile', label: 'Over time' },
] as const;
const INTERPOLATION = [
  { value: 'step', label: 'Steps' },
  { value: 'linear', label: 'Straight ramps' },
] as const;
const POINT_COLUMNS = [
  { key: 'timeS', label: 'Time', kind: 'time' },
  { key: 'temperatureC', label: 'Temperature', kind: 'temperature' },
] as const;

export type AmbientSectionProps = { ambient: RawAmbient | undefined };

/** The room air: one temperature, or points over time held in steps or joined by ramps. */
export function AmbientSection({ ambient = {} }: AmbientSectionProps) {
  const { set } = useEditorActions();
  const error = useFieldError('document.ambient');
  const kind = ambient.profile !== undefined ? 'profile' : 'constant';
  const first = ambient.profile?.[0]?.temperatureC;
  return (
    <View style={styles.box}>
      <ChoiceRow
        label="Ambient"
        value={kind}
        error={error}
        options={KINDS}
        onChange={(to) => {
          if (to === kind) return;
          set('document.ambient', to === 'profile' ? { profile: [{ timeS: 0, temperatureC: ambient.temperatureC ?? '' }] } : { temperatureC: first ?? '' });
        }}
      />
      {kind === 'constant' ? (
        <View style={styles.field}>
          <QuantityField field="document.ambient.temperatureC" value={ambient.temperatureC} kind="temperature" label="Temperature" fullLabel="Ambient temperature" />
        </View>
      ) : (
        <>
          <ChoiceRow
            label="Between points"
            value={ambient.interpolation === 'linear' ? 'linear' : 'step'}
            options={INTERPOLATION}
            onChange={(to) => set('document.ambient.interpolation', to === 'step' ? undefined : to)}
          />
          <Text variant="caption" tone="muted">
            {ambient.interpolation === 'linear'
              ? 'Straight ramps between points, flat before the first and after the last.'
              : 'Each point holds until the next; the first also before it, the last after it.'}{' '}
            Times run from the start of the profile.
          </Text>
          <PointList field="document.ambient.profile" points={ambient.profile} columns={POINT_COLUMNS} noun="point" minRows={1} owner="Ambient" />
        </>
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  field: { flexDirection: 'row', maxWidth: 260 },
});
