import { StyleSheet, View } from 'react-native';

import { errorMessage } from '@/api';
import { Card, ErrorState, LoadingState, Text } from '@/components/ui';
import { color } from '@/constants/theme';

import { useMembers } from '../api';
import { MemberRow } from './member-row';

export type MemberListProps = { teamId: number; teamName: string; userId: number; canManage: boolean };

export function MemberList({ teamId, teamName, userId, canManage }: MemberListProps) {
  const members = useMembers(teamId);
  return (
    <Card>
      <Text variant="heading">Members{members.data ? ` (${members.data.length})` : ''}</Text>
      {members.isPending ? <LoadingState label="Loading members…" /> : null}
      {members.isError ? (
        <ErrorState
          title="Could not load the members"
          message={errorMessage(members.error)}
          onRetry={() => members.refetch()}
          retrying={members.isFetching}
        />
      ) : null}
      {members.data?.map((member, index) => (
        <View key={member.userId} style={index > 0 ? styles.divider : undefined}>
          <MemberRow
            teamId={teamId}
            teamName={teamName}
            member={member}
            isYou={member.userId === userId}
            canManage={canManage}
          />
        </View>
      ))}
    </Card>
  );
}

const styles = StyleSheet.create({
  divider: { borderTopWidth: 1, borderTopColor: color.border },
});
