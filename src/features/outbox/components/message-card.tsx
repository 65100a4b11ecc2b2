import { StyleSheet, View } from 'react-native';

import { Card, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { formatDateTime } from '@/features/studies/format';

import type { OutboxMessage } from '../types';
import { MessageText } from './message-text';

export type MessageCardProps = { message: OutboxMessage };

export function MessageCard({ message }: MessageCardProps) {
  return (
    <Card testID={`message-${message.id}`}>
      <Text variant="heading">{message.subject}</Text>
      <View style={styles.meta}>
        <Text variant="mono" tone="muted">
          To {message.to}
        </Text>
        <Text variant="caption" tone="faint">
          {formatDateTime(message.createdAt)}
        </Text>
      </View>
      <MessageText text={message.text} />
    </Card>
  );
}

const styles = StyleSheet.create({
  meta: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.sm },
});
