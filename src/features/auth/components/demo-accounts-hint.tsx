import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

const DEMO_ACCOUNTS = [
  { email: 'owner@example.com', role: 'owner' },
  { email: 'designer@example.com', role: 'designer' },
  { email: 'reviewer@example.com', role: 'reviewer' },
] as const;

export type DemoAccountsHintProps = { onPick: (email: string) => void };

/** The seeded demo accounts, one per role; picking one fills the e-mail field. */
export function DemoAccountsHint({ onPick }: DemoAccountsHintProps) {
  return (
    <View style={styles.box}>
      <Text variant="label">Demo accounts (demo data)</Text>
      <Text variant="caption" tone="muted">
        One per role. The shared password is printed in the README.
      </Text>
      <View style={styles.list}>
        {DEMO_ACCOUNTS.map((account) => (
          <Pressable
            key={account.email}
            role="button"
            accessibilityLabel={`Use demo account ${account.email}`}
            onPress={() => onPick(account.email)}
            style={({ pressed }) => [styles.row, pressed && styles.pressed]}
          >
            <Text variant="mono">{account.email}</Text>
            <Text variant="caption" tone="faint">
              {account.role}
            </Text>
          </Pressable>
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.xs,
    padding: spacing.md,
    borderRadius: radius.lg,
    backgroundColor: color.surfaceMuted,
  },
  list: { marginTop: spacing.xs },
  row: {
    flexDirection: 'row',
    justifyContent: 'space-between',
    alignItems: 'center',
    paddingVertical: spacing.xs,
    paddingHorizontal: spacing.xs,
    borderRadius: radius.sm,
  },
  pressed: { backgroundColor: color.border },
});
