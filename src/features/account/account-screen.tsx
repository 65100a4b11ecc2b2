import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, Card, InlineAlert, Page, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { useSignedInSession, useSignOut } from '@/features/auth/api';
import { ROLE_LABELS } from '@/features/auth/roles';
import type { Role } from '@/features/auth/types';

const ROLE_SUMMARY: Record<Role, string> = {
  owner: 'Manages the team, its members and catalogues; creates and edits studies.',
  designer: 'Creates and edits studies and the team catalogues.',
  reviewer: 'Reads every study of the team, comments, approves or asks for changes.',
};

/** Who is signed in, their teams and roles, and sign-out. */
export function AccountScreen() {
  const { user, memberships } = useSignedInSession();
  const signOut = useSignOut();

  return (
    <Page width="readable">
      <Text variant="title">Account</Text>
      <Card>
        <Text variant="heading">{user.name}</Text>
        <Text variant="mono" tone="muted">
          {user.email}
        </Text>
      </Card>
      <Card>
        <Text variant="heading">{memberships.length === 1 ? 'Team' : 'Teams'}</Text>
        {memberships.length === 0 ? <Text tone="muted">You are not a member of any team.</Text> : null}
        {memberships.map((membership, index) => (
          <View key={membership.teamId} style={[styles.team, index > 0 && styles.divider]}>
            <View style={styles.teamHead}>
              <Text variant="bodyStrong" style={styles.teamName}>
                {membership.teamName}
              </Text>
              <Text variant="label" tone="accent">
                {ROLE_LABELS[membership.role]}
              </Text>
            </View>
            <Text variant="caption" tone="muted">
              {ROLE_SUMMARY[membership.role]}
            </Text>
          </View>
        ))}
      </Card>
      {signOut.isError ? <InlineAlert message={errorMessage(signOut.error)} /> : null}
      <Button
        label="Sign out"
        variant="secondary"
        onPress={() => signOut.mutate()}
        busy={signOut.isPending}
        style={styles.signOut}
      />
    </Page>
  );
}

const styles = StyleSheet.create({
  team: { gap: spacing.xxs, paddingVertical: spacing.sm },
  divider: { borderTopWidth: 1, borderTopColor: color.border },
  teamHead: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.md },
  teamName: { flexShrink: 1 },
  signOut: { alignSelf: 'flex-start' },
});
