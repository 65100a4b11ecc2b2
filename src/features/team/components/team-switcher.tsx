import { useState } from 'react';
import { Modal, Pressable, StyleSheet, Text as NativeText, View } from 'react-native';

import { Icon, Text } from '@/components/ui';
import { color, fontFamily, fontSize, radius, size, spacing } from '@/constants/theme';
import { ROLE_LABELS } from '@/features/auth/roles';

import { useCurrentTeam } from '../current-team';

export type TeamSwitcherProps = {
  /** `dark` on the sidebar, `light` on the phone's top bar. */
  tone: 'dark' | 'light';
};

/** The current team and role; with several teams, a menu to pick the one to work in. */
export function TeamSwitcher({ tone }: TeamSwitcherProps) {
  const { team, memberships, selectTeam } = useCurrentTeam();
  const [open, setOpen] = useState(false);
  if (!team) return null;

  const label = `${team.teamName} · ${ROLE_LABELS[team.role]}`;
  const textStyle = [styles.current, tone === 'dark' ? styles.currentDark : styles.currentLight];
  if (memberships.length < 2) {
    return (
      <NativeText style={textStyle} numberOfLines={2}>
        {label}
      </NativeText>
    );
  }

  return (
    <>
      <Pressable
        role="button"
        accessibilityLabel={`Team: ${label}. Switch team`}
        onPress={() => setOpen(true)}
        style={({ pressed }) => [styles.trigger, pressed && (tone === 'dark' ? styles.pressedDark : styles.pressedLight)]}
      >
        <NativeText style={[textStyle, styles.triggerText]} numberOfLines={2}>
          {label}
        </NativeText>
        <Icon name="chevronDown" size={16} color={tone === 'dark' ? color.sidebarText : color.inkMuted} />
      </Pressable>
      <Modal visible={open} transparent animationType="none" onRequestClose={() => setOpen(false)}>
        <Pressable accessibilityLabel="Close the team list" style={styles.backdrop} onPress={() => setOpen(false)}>
          <Pressable style={styles.sheet} onPress={() => undefined}>
            <Text variant="heading">Work in team</Text>
            <Text variant="caption" tone="muted">
              The studies list and new studies follow the team you pick.
            </Text>
            <View role="radiogroup" aria-label="Team" style={styles.options}>
              {memberships.map((m) => {
                const selected = m.teamId === team.teamId;
                return (
                  <Pressable
                    key={m.teamId}
                    role="radio"
                    aria-checked={selected}
                    accessibilityState={{ checked: selected }}
                    onPress={() => {
                      selectTeam(m.teamId);
                      setOpen(false);
                    }}
                    style={({ pressed }) => [styles.option, selected && styles.optionSelected, pressed && styles.optionPressed]}
                  >
                    <Text variant="bodyStrong" tone={selected ? 'accent' : 'default'}>
                      {m.teamName}
                    </Text>
                    <Text variant="caption" tone="muted">
                      {ROLE_LABELS[m.role]}
                    </Text>
                  </Pressable>
                );
              })}
            </View>
          </Pressable>
        </Pressable>
      </Modal>
    </>
  );
}

const styles = StyleSheet.create({
  current: { fontFamily: fontFamily.regular, fontSize: fontSize.xs },
  currentDark: { color: color.sidebarMuted },
  currentLight: { color: color.inkMuted, textAlign: 'right' },
  trigger: {
    flexDirection: 'row',
    alignItems: 'center',
    gap: spacing.xxs,
    minHeight: 32,
    paddingHorizontal: spacing.xs,
    marginHorizontal: -spacing.xs,
    borderRadius: radius.sm,
    flexShrink: 1,
  },
  triggerText: { flexShrink: 1 },
  pressedDark: { backgroundColor: color.sidebarActive },
  pressedLight: { backgroundColor: color.surfaceMuted },
  backdrop: {
    flex: 1,
    justifyContent: 'center',
    alignItems: 'center',
    padding: spacing.lg,
    backgroundColor: color.scrim,
  },
  sheet: {
    width: '100%',
    maxWidth: size.formMaxWidth,
    gap: spacing.sm,
    padding: spacing.xl,
    borderRadius: radius.lg,
    backgroundColor: color.surface,
  },
  options: { gap: spacing.xs, marginTop: spacing.sm },
  option: {
    minHeight: size.touchTarget,
    justifyContent: 'center',
    paddingHorizontal: spacing.md,
    paddingVertical: spacing.sm,
    borderRadius: radius.md,
    borderWidth: 1,
    borderColor: color.border,
  },
  optionSelected: { borderColor: color.accent, backgroundColor: color.accentSoft },
  optionPressed: { backgroundColor: color.surfaceMuted },
});
