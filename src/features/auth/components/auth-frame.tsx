import type { ReactNode } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { BrandMark, Card, Text, useIsWide } from '@/components/ui';
import { color, size, spacing } from '@/constants/theme';

export type AuthFrameProps = { title: string; children: ReactNode; footer?: ReactNode };

/** Shared chrome of the signed-out screens: product name, one line on what it does, the form card. */
export function AuthFrame({ title, children, footer }: AuthFrameProps) {
  const wide = useIsWide();
  return (
    <ScrollView contentContainerStyle={styles.scroll} keyboardShouldPersistTaps="handled">
      <View style={[styles.layout, wide && styles.layoutWide]}>
        <View style={[styles.intro, wide && styles.introWide]}>
          <View style={styles.brand}>
            <BrandMark size={32} />
            <Text variant="title">Junctura</Text>
          </View>
          <Text tone="muted" style={styles.tagline}>
            Thermal and dissipation design for linear pass elements: junction temperature over the real load
            profile, SOA checks and heatsink choice, reviewed by your team.
          </Text>
        </View>
        <Card style={styles.card}>
          <Text variant="title">{title}</Text>
          {children}
        </Card>
        {footer ? <View style={[styles.footer, wide && styles.footerWide]}>{footer}</View> : null}
      </View>
    </ScrollView>
  );
}

const styles = StyleSheet.create({
  scroll: { flexGrow: 1, justifyContent: 'center', padding: spacing.lg, backgroundColor: color.canvas },
  layout: { width: '100%', maxWidth: size.formMaxWidth, alignSelf: 'center', gap: spacing.xl },
  layoutWide: { maxWidth: size.formMaxWidth },
  intro: { gap: spacing.sm },
  introWide: { marginBottom: spacing.sm },
  brand: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  tagline: { maxWidth: size.formMaxWidth },
  card: { padding: spacing.xl, gap: spacing.lg },
  footer: { gap: spacing.sm },
  footerWide: {},
});
