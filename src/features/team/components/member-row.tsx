import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Button, ConfirmRow, InlineAlert, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { ROLE_LABELS } from '@/features/auth/roles';
import { formatDate } from '@/features/studies/format';

import { useChangeRole, useRemoveMember } from '../api';
import type { Member } from '../types';
import { RoleSelect } from './role-select';

export type MemberRowProps = {
  teamId: number;
  teamName: string;
  member: Member;
  isYou: boolean;
  /** Owners change roles and remove members; everyone else only reads the list. */
  canManage: boolean;
};

export function MemberRow({ teamId, teamName, member, isYou, canManage }: MemberRowProps) {
  const changeRole = useChangeRole(teamId);
  const remove = useRemoveMember(teamId);
  const [confirming, setConfirming] = useState(false);
  const failure = changeRole.error ?? remove.error;

  return (
    <View testID={`member-row-${member.userId}`} style={styles.row}>
      <View style={styles.head}>
        <View style={styles.who}>
          <Text variant="bodyStrong">
            {member.name}
            {isYou ? <Text tone="muted"> (you)</Text> : null}
          </Text>
          <Text variant="mono" tone="muted" numberOfLines={1}>
            {member.email}
          </Text>
          <Text variant="caption" tone="faint">
            Member since {formatDate(member.since)}
          </Text>
        </View>
        {canManage ? null : (
          <Text variant="label" tone="accent">
            {ROLE_LABELS[member.role]}
          </Text>
        )}
      </View>
      {canManage ? (
        <View style={styles.manage}>
          <RoleSelect
            label={`Role of ${member.name}`}
            value={member.role}
            disabled={changeRole.isPending}
            onChange={(role) => {
              remove.reset();
              changeRole.mutate({ userId: member.userId, role });
            }}
          />
          {confirming ? null : (
            <Button
              label={isYou ? 'Leave' : 'Remove'}
              variant="ghost"
              onPress={() => {
                changeRole.reset();
                setConfirming(true);
              }}
            />
          )}
        </View>
      ) : null}
      {confirming ? (
        <ConfirmRow
          message={
            isYou
              ? `Leave ${teamName}? You lose access to its studies and catalogues.`
              : `Remove ${member.name} from ${teamName}? They lose access to its studies and catalogues.`
          }
          confirmLabel={isYou ? 'Leave team' : 'Remove member'}
          busy={remove.isPending}
          onConfirm={() => remove.mutate(member.userId, { onSettled: () => setConfirming(false) })}
          onCancel={() => setConfirming(false)}
        />
      ) : null}
      {failure ? <InlineAlert message={errorMessage(failure)} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  row: { gap: spacing.sm, paddingVertical: spacing.md },
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'flex-start', gap: spacing.md },
  who: { gap: spacing.xxs, flexShrink: 1 },
  manage: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'center', justifyContent: 'space-between', gap: spacing.sm },
});
