import { StyleSheet, View } from 'react-native';

import { Chip } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { ROLE_LABELS } from '@/features/auth/roles';
import type { Role } from '@/features/auth/types';
import { ROLE_VALUES } from '@/validation';

export type RoleSelectProps = {
  /** Names the group for assistive tech, e.g. "Role of Dan". */
  label: string;
  value: Role;
  onChange: (role: Role) => void;
  disabled?: boolean;
};

/** One of the three roles, as a row of choices. */
export function RoleSelect({ label, value, onChange, disabled }: RoleSelectProps) {
  return (
    <View role="radiogroup" aria-label={label} aria-disabled={disabled} style={styles.row}>
      {ROLE_VALUES.map((role) => (
        <Chip
          key={role}
          label={ROLE_LABELS[role]}
          selected={role === value}
          onPress={() => {
            if (!disabled && role !== value) onChange(role);
          }}
        />
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
