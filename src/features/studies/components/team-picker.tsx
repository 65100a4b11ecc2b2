import { StyleSheet, View } from 'react-native';

import { Chip, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import type { Membership } from '@/features/auth/types';

export type TeamPickerProps = {
  teams: readonly Membership[];
  value: number;
  onChange: (teamId: number) => void;
};

/** Which team a new study belongs to; shown only when the member can write in more than one. */
export function TeamPicker({ teams, value, onChange }: TeamPickerProps) {
  return (
    <View style={styles.field}>
      <Text variant="label" tone="muted">
        Team
      </Text>
      <View role="radiogroup" aria-label="Team" style={styles.options}>
        {teams.map((team) => (
          <Chip
            key={team.teamId}
            label={team.teamName}
            selected={team.teamId === value}
            onPress={() => onChange(team.teamId)}
          />
        ))}
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  field: { gap: spacing.xs },
  options: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
