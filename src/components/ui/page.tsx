import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { size, spacing } from '@/constants/theme';

export type PageProps = {
  children: ReactNode;
  /** Narrower column for forms and reading. */
  width?: 'content' | 'readable' | 'form';
};

const maxWidths = {
  content: size.contentMaxWidth,
  readable: size.readableMaxWidth,
  form: size.formMaxWidth,
} as const;

/** A scrolling screen body, centred and capped in width on large windows. */
export function Page({ children, width = 'content' }: PageProps) {
  return (
    <ScrollView contentContainerStyle={styles.scroll} keyboardShouldPersistTaps="handled">
      <View style={[styles.column, { maxWidth: maxWidths[width] }]}>{children}</View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, paddingHorizontal: spacing.lg, paddingVertical: spacing.xl },
  column: { width: '100%', alignSelf: 'center', gap: spacing.lg },
});
