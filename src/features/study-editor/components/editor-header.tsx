import { StyleSheet, View } from 'react-native';

import { Button, Text, useIsWide } from '@/components/ui';
import { StatusBadge } from '@/features/studies/components/status-badge';
import type { Study } from '@/features/studies/types';
import { spacing } from '@/constants/theme';

export type EditorHeaderProps = {
  study: Study;
  title: string;
  baseVersion: number;
  dirty: boolean;
  savedVersion: number | null;
  saving: boolean;
  allOpen: boolean;
  onSave: () => void;
  onDiscard: () => void;
  onToggleAll: () => void;
};

/** What is being edited, whether it is saved, and the commands that act on the whole study. */
export function EditorHeader({ study, title, baseVersion, dirty, savedVersion, saving, allOpen, onSave, onDiscard, onToggleAll }: EditorHeaderProps) {
  const wide = useIsWide();
  const state = dirty ? 'Unsaved changes, kept on this device until you save' : savedVersion !== null ? `Saved as version ${savedVersion}` : 'No unsaved changes';
  return (
    <View style={[styles.box, wide && styles.wide]}>
      <View style={styles.titles}>
        <View style={styles.badgeRow}>
          <StatusBadge status={study.status} />
          <Text variant="caption" tone="muted">
            Editing from version {baseVersion}
          </Text>
        </View>
        <Text variant={wide ? 'title' : 'heading'} numberOfLines={2}>
          {title || 'Untitled study'}
        </Text>
        <Text variant="caption" tone={dirty ? 'accent' : 'muted'} testID="save-state">
          {state}
        </Text>
        {study.status !== 'draft' ? (
          <Text variant="caption" tone="muted">
            Saving makes a new draft revision; {study.status === 'approved' ? 'the approval stays with' : 'the review belongs to'} version {study.version}.
          </Text>
        ) : null}
      </View>
      <View style={styles.actions}>
        <Button label="Save" onPress={onSave} busy={saving} disabled={!dirty} />
        <Button label="Discard changes" variant="secondary" onPress={onDiscard} disabled={!dirty || saving} />
        <Button label={allOpen ? 'Close all sections' : 'Open all sections'} variant="ghost" onPress={onToggleAll} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  wide: { flexDirection: 'row', alignItems: 'flex-start', justifyContent: 'space-between' },
  titles: { gap: spacing.xxs, flexShrink: 1 },
  badgeRow: { flexDirection: 'row', alignItems: 'center', gap: spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
