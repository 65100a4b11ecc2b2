import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { Button, EmptyState, ErrorState, LoadingState, Page, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { useOutbox } from './api';
import { MessageCard } from './components/message-card';

/** Development only: the mail the server would have sent, kept by its local fake transport. */
export function OutboxScreen() {
  const outbox = useOutbox();
  const status = errorStatus(outbox.error);

  let body;
  if (outbox.isPending) {
    body = <LoadingState label="Loading messages…" />;
  } else if (status === 404) {
    body = (
      <EmptyState
        title="Mail goes to a real mail server"
        message="This server sends e-mail through SMTP, so no copy is kept here. Read the messages in the recipients' mailboxes."
      />
    );
  } else if (status === 403) {
    body = <EmptyState title="Only team owners read the outbox" />;
  } else if (outbox.isError) {
    body = (
      <ErrorState
        title="Could not load the outbox"
        message={errorMessage(outbox.error)}
        onRetry={() => outbox.refetch()}
        retrying={outbox.isFetching}
      />
    );
  } else if (outbox.data.length === 0) {
    body = (
      <EmptyState
        title="No messages yet"
        message="Invitations, password resets and review notices to your teams' members appear here."
      />
    );
  } else {
    body = (
      <View style={styles.list}>
        {outbox.data.map((message) => (
          <MessageCard key={message.id} message={message} />
        ))}
      </View>
    );
  }

  return (
    <Page width="readable">
      <View style={styles.header}>
        <View style={styles.heading}>
          <Text variant="title">Outbox</Text>
          <Text tone="muted">Development mail: messages to the members and invitees of the teams you own, newest first.</Text>
        </View>
        {outbox.isSuccess ? (
          <Button label="Refresh" variant="secondary" onPress={() => outbox.refetch()} busy={outbox.isFetching} />
        ) : null}
      </View>
      {body}
    </Page>
  );
}

const styles = StyleSheet.create({
  header: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'flex-end', gap: spacing.md },
  heading: { gap: spacing.xxs, flexShrink: 1 },
  list: { gap: spacing.md },
});
