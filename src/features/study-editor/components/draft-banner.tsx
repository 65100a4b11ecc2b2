import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { formatDateTime } from '@/features/studies/format';
import { color, radius, spacing } from '@/constants/theme';

import type { Draft } from '../draft-storage';

export type DraftBannerProps = { draft: Draft; currentVersion: number; onRestore: () => void; onDiscard: () => void };

/** Offers the unsaved edits this device kept from an earlier visit. */
export function DraftBanner({ draft, currentVersion, onRestore, onDiscard }: DraftBannerProps) {
  const moved = draft.baseVersion !== currentVersion;
  return (
    <View role="alert" style={styles.box} testID="draft-banner">
      <Text variant="bodyStrong">Unsaved changes from {formatDateTime(draft.savedAt)} are kept on this device</Text>
      <Text>
        They started from version {draft.baseVersion}.
        {moved ? ` The study has been saved since (now version ${currentVersion}): saving them will show both versions first.` : ''} New edits are kept only after you restore or discard them.
      </Text>
      <View style={styles.actions}>
        <Button label="Restore unsaved changes" onPress={onRestore} />
        <Button label="Discard them" variant="secondary" onPress={onDiscard} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.info, backgroundColor: color.infoSoft },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
