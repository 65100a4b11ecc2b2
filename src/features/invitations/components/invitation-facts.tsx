import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { ROLE_LABELS } from '@/features/auth/roles';
import { formatDateTime } from '@/features/studies/format';

import type { InvitationDetails } from '../types';

export type InvitationFactsProps = { invitation: InvitationDetails };

/** Who invites, to which team, in which role, and until when the link works (the address is in the form). */
export function InvitationFacts({ invitation }: InvitationFactsProps) {
  const facts = [
    { label: 'Team', value: invitation.teamName },
    { label: 'Role', value: ROLE_LABELS[invitation.role] },
    { label: 'Invited by', value: invitation.invitedBy ?? 'a team owner' },
    { label: 'Link works until', value: formatDateTime(invitation.expiresAt) },
  ];
  return (
    <View style={styles.box}>
      {facts.map((fact) => (
        <View key={fact.label} style={styles.fact}>
          <Text variant="caption" tone="faint" style={styles.label}>
            {fact.label}
          </Text>
          <Text style={styles.value}>
            {fact.value}
          </Text>
        </View>
      ))}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, backgroundColor: color.surfaceMuted },
  fact: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'baseline', gap: spacing.sm },
  label: { width: 110 },
  value: { flexShrink: 1 },
});
