import type { ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

export type WarningBoxProps = { title: string; children: ReactNode; testID?: string };

/** A warning the reader must not miss: a titled box in the warning tone. */
export function WarningBox({ title, children, testID }: WarningBoxProps) {
  return (
    <View role="alert" testID={testID} style={styles.box}>
      <Text variant="label" style={styles.title}>
        {title}
      </Text>
      {children}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderLeftWidth: 4, backgroundColor: color.warningSoft, borderLeftColor: color.warning },
  title: { color: color.warning },
});
