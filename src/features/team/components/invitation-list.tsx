import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, Card, ConfirmRow, ErrorState, InlineAlert, LoadingState, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import { ROLE_LABELS } from '@/features/auth/roles';
import { formatDateTime } from '@/features/studies/format';

import { useInvitations, useRevokeInvitation } from '../api';
import type { PendingInvitation } from '../types';

export type InvitationListProps = { teamId: number };

/** Invitations sent and not yet used, with revoke. */
export function InvitationList({ teamId }: InvitationListProps) {
  const invitations = useInvitations(teamId, true);
  return (
    <Card>
      <Text variant="heading">Pending invitations</Text>
      {invitations.isPending ? <LoadingState label="Loading invitations…" /> : null}
      {invitations.isError ? (
        <ErrorState
          title="Could not load the invitations"
          message={errorMessage(invitations.error)}
          onRetry={() => invitations.refetch()}
          retrying={invitations.isFetching}
        />
      ) : null}
      {invitations.data?.length === 0 ? <Text tone="muted">No invitation is waiting to be accepted.</Text> : null}
      {invitations.data?.map((invitation, index) => (
        <View key={invitation.id} style={index > 0 ? styles.divider : undefined}>
          <InvitationRow teamId={teamId} invitation={invitation} />
        </View>
      ))}
    </Card>
  );
}

function InvitationRow({ teamId, invitation }: { teamId: number; invitation: PendingInvitation }) {
  const revoke = useRevokeInvitation(teamId);
  const [confirming, setConfirming] = useState(false);
  return (
    <View testID={`invitation-row-${invitation.id}`} style={styles.row}>
      <View style={styles.head}>
        <View style={styles.who}>
          <Text variant="mono">{invitation.email}</Text>
          <Text variant="caption" tone="faint">
            {ROLE_LABELS[invitation.role]}
            {invitation.invitedBy ? ` · invited by ${invitation.invitedBy.name}` : ''} · link valid until{' '}
            {formatDateTime(invitation.expiresAt)}
          </Text>
        </View>
        {confirming ? null : <Button label="Revoke" variant="ghost" onPress={() => setConfirming(true)} />}
      </View>
      {confirming ? (
        <ConfirmRow
          message={`Revoke the invitation to ${invitation.email}? The link stops working.`}
          confirmLabel="Revoke invitation"
          busy={revoke.isPending}
          onConfirm={() => revoke.mutate(invitation.id, { onSettled: () => setConfirming(false) })}
          onCancel={() => setConfirming(false)}
        />
      ) : null}
      {revoke.isError ? <InlineAlert message={errorMessage(revoke.error)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.sm, paddingVertical: spacing.sm },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'center', gap: spacing.md },
  who: { gap: spacing.xxs, flexShrink: 1 },
  divider: { borderTopWidth: 1, borderTopColor: color.border },
});
