import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { useTeamSettings } from '@/features/team/api';
import { defaultLines } from '@/features/team/team-settings-lines';

/** What a new study of the team takes from its defaults (nothing is shown while it takes none). */
export function NewStudyDefaults({ teamId }: { teamId: number }) {
  const settings = useTeamSettings(teamId);
  const lines = settings.data ? defaultLines(settings.data.settings).filter((l) => l.fromTeam) : [];
  if (lines.length === 0) return null;
  return (
    <View style={styles.box} testID="new-study-defaults">
      <Text variant="label">The team&apos;s defaults for new studies</Text>
      {lines.map((l) => (
        <Text key={l.key} variant="caption" tone="muted">
          {`${l.label}: ${l.value} (${l.source})`}
        </Text>
      ))}
      <Text variant="caption" tone="faint">
        They are written into the study as values when it is created; changing the team settings later does not change it.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xxs, borderLeftWidth: 3, borderLeftColor: color.info, borderRadius: radius.sm, paddingLeft: spacing.sm },
});
