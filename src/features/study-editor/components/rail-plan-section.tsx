import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { useEditorActions, useErrorsUnder } from '../editor-context';
import { railPlanFacts } from '../rail-plan-lines';
import type { RawObject } from '../types';

export type RailPlanSectionProps = { plan: RawObject | undefined };

/**
 * The rail plan, read here as plain facts (it is kept as saved). With a plan, electrical
 * segments give Vout and Iload only: the input comes from the tap the plan selects.
 */
export function RailPlanSection({ plan }: RailPlanSectionProps) {
  const { set } = useEditorActions();
  const problems = useErrorsUnder('document.railPlan');
  if (!plan) {
    return <Text tone="muted">No rail plan: every electrical segment gives its own input voltage (Vin).</Text>;
  }
  const { facts, sources, taps } = railPlanFacts(plan);
  return (
    <View style={styles.box}>
      {facts.map((f) => (
        <View key={f.label} style={styles.fact}>
          <Text variant="caption" tone="faint">
            {f.label}
          </Text>
          <Text>{f.value}</Text>
        </View>
      ))}
      <View style={styles.fact}>
        <Text variant="caption" tone="faint">
          Sources
        </Text>
        {sources.map((line) => (
          <Text key={line}>{line}</Text>
        ))}
      </View>
      <View style={styles.fact}>
        <Text variant="caption" tone="faint">
          Taps, lowest first
        </Text>
        {taps.map((line) => (
          <Text key={line}>{line}</Text>
        ))}
      </View>
      {typeof plan.notes === 'string' ? (
        <Text variant="caption" tone="muted">
          {plan.notes}
        </Text>
      ) : null}
      {problems.map((p) => (
        <Text key={p.field} variant="caption" tone="danger" role="alert">
          {p.field.replace('document.', '')}: {p.reason}
        </Text>
      ))}
      <Text variant="caption" tone="faint">
        The plan is kept as saved; its sources, taps and thresholds are not edited here yet.
      </Text>
      <Button label="Remove rail plan" variant="ghost" onPress={() => set('document.railPlan', undefined)} style={styles.button} />
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  fact: { gap: spacing.xxs, paddingBottom: spacing.xs, borderBottomWidth: 1, borderBottomColor: color.border },
  button: { alignSelf: 'flex-start' },
});
