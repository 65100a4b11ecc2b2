import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { EmptyState, Page, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { useSignedInSession } from '@/features/auth/api';
import { ROLE_LABELS } from '@/features/auth/roles';

import { InvitationList } from './components/invitation-list';
import { InviteForm } from './components/invite-form';
import { MemberList } from './components/member-list';
import { useCurrentTeam } from './current-team';

/** Members and roles of the current team; owners also invite, change roles and remove. */
export function TeamScreen() {
  const { user } = useSignedInSession();
  const { team } = useCurrentTeam();

  if (!team) {
    return (
      <Page width="readable">
        <Text variant="title">Team</Text>
        <EmptyState title="You are not in a team" message="Ask a team owner to invite you." />
      </Page>
    );
  }
  const isOwner = team.role === 'owner';

  return (
    <Page width="readable">
      <View style={styles.heading}>
        <Text variant="title">{team.teamName}</Text>
        <Text tone="muted">
          Your role here: {ROLE_LABELS[team.role]}.
          {isOwner ? '' : ' Only owners change roles and invite members.'}
        </Text>
        <View style={styles.links}>
          <Link href="/team-settings" style={styles.link}>
            <Text variant="label" tone="accent">
              {isOwner ? 'Team settings: defaults for new studies' : 'Team settings (read-only)'}
            </Text>
          </Link>
          {isOwner ? (
            <>
              <Link href="/activity" style={styles.link}>
              <Text variant="label" tone="accent">
                Activity log
              </Text>
            </Link>
              <Link href="/outbox" style={styles.link}>
                <Text variant="label" tone="accent">
                  Outbox (development mail)
                </Text>
              </Link>
            </>
          ) : null}
        </View>
      </View>
      <MemberList key={team.teamId} teamId={team.teamId} teamName={team.teamName} userId={user.id} canManage={isOwner} />
      {isOwner ? (
        <>
          <InviteForm key={`invite-${team.teamId}`} teamId={team.teamId} teamName={team.teamName} />
          <InvitationList teamId={team.teamId} />
        </>
      ) : null}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xxs },
  links: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.lg },
  link: { paddingVertical: spacing.xs },
});
