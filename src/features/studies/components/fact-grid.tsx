import { StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { Fact } from '../document-facts';

export type FactGridProps = { facts: readonly Fact[] };

/** Label-over-value pairs in aligned columns: two on a phone, three on a wide window. */
export function FactGrid({ facts }: FactGridProps) {
  const wide = useIsWide();
  return (
    <View style={styles.grid}>
      {facts.map((fact) => (
        <View key={fact.label} style={[styles.fact, wide ? styles.third : styles.half]}>
          <Text variant="caption" tone="faint">
            {fact.label}
          </Text>
          <Text>{fact.value}</Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  grid: { flexDirection: 'row', flexWrap: 'wrap', rowGap: spacing.md },
  fact: { gap: spacing.xxs, paddingRight: spacing.md },
  half: { width: '50%' },
  third: { width: '33.33%' },
});
