import type { ReactNode } from 'react';
import { Pressable, StyleSheet, View } from 'react-native';

import { Icon, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

export type EditorSectionProps = {
  title: string;
  /** One line under the title: what the section holds now. */
  summary?: string;
  open: boolean;
  onToggle: () => void;
  problems: number;
  children: ReactNode;
  testID?: string;
};

/**
 * A collapsible part of the editor. A closed section stays mounted (only hidden), so its
 * fields keep what is being typed and still name their problems in the list at the top.
 */
export function EditorSection({ title, summary, open, onToggle, problems, children, testID }: EditorSectionProps) {
  return (
    <View style={styles.card} testID={testID}>
      <Pressable
        role="button"
        aria-expanded={open}
        accessibilityState={{ expanded: open }}
        accessibilityLabel={`${title}${problems > 0 ? `, ${problems} ${problems === 1 ? 'problem' : 'problems'}` : ''}`}
        onPress={onToggle}
        style={({ pressed }) => [styles.head, pressed && styles.pressed]}
      >
        <View style={styles.titles}>
          <Text variant="heading">{title}</Text>
          {summary ? (
            <Text variant="caption" tone="muted" numberOfLines={1}>
              {summary}
            </Text>
          ) : null}
        </View>
        {problems > 0 ? (
          <View style={styles.badge}>
            <Text variant="caption" style={styles.badgeText}>
              {problems}
            </Text>
          </View>
        ) : null}
        <View style={open ? styles.chevronOpen : undefined}>
          <Icon name="chevronDown" size={20} color={color.inkMuted} />
        </View>
      </Pressable>
      <View style={[styles.body, !open && styles.hidden]}>{children}</View>
    </View>
  );
}

const styles = StyleSheet.create({
  card: { backgroundColor: color.surface, borderColor: color.border, borderWidth: 1, borderRadius: radius.lg, overflow: 'hidden' },
  head: { flexDirection: 'row', alignItems: 'center', gap: spacing.md, paddingHorizontal: spacing.lg, paddingVertical: spacing.md },
  pressed: { backgroundColor: color.surfaceMuted },
  titles: { flex: 1, gap: spacing.xxs },
  badge: { minWidth: 22, paddingHorizontal: spacing.xs, borderRadius: 11, backgroundColor: color.danger, alignItems: 'center' },
  badgeText: { color: color.onAccent, lineHeight: 22 },
  chevronOpen: { transform: [{ rotate: '180deg' }] },
  body: { gap: spacing.md, paddingHorizontal: spacing.lg, paddingBottom: spacing.lg },
  hidden: { display: 'none' },
});
