import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { BrandMark, Text } from '@/components/ui';
import { color, size, spacing } from '@/constants/theme';

export function NotFoundScreen() {
  return (
    <View style={styles.page}>
      <View style={styles.box}>
        <BrandMark size={32} />
        <Text variant="title">Page not found</Text>
        <Text tone="muted">There is nothing at this address. It may have moved, or the link is mistyped.</Text>
        <Link href="/" style={styles.link}>
          <Text variant="bodyStrong" tone="accent">
            Go to your studies
          </Text>
        </Link>
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  page: { flex: 1, justifyContent: 'center', alignItems: 'center', padding: spacing.lg, backgroundColor: color.canvas },
  box: { width: '100%', maxWidth: size.formMaxWidth, gap: spacing.md },
  link: { paddingVertical: spacing.xs },
});
