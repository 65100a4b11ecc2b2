import { Link, type Href } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Icon, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

export type BackLinkProps = { href: Href; label: string };

export function BackLink({ href, label }: BackLinkProps) {
  return (
    <Link href={href} style={styles.link}>
      <View style={styles.inner}>
        <Icon name="back" size={18} color={color.accent} />
        <Text variant="label" tone="accent">
          {label}
        </Text>
      </View>
    </Link>
  );
}

const styles = StyleSheet.create({
  link: { alignSelf: 'flex-start', paddingVertical: spacing.xs },
  inner: { flexDirection: 'row', alignItems: 'center', gap: spacing.xxs },
});
