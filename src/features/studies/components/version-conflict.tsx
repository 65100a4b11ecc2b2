import { useEffect } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text, useIsWide } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { useRevisions } from '@/features/revisions/api';

import { formatDateTime } from '../format';
import type { Study } from '../types';

export type VersionConflictProps = {
  studyId: number;
  /** The version the refused save started from. */
  baseVersion: number;
  /** The server's current study, from the 409 answer. */
  current: Study;
  /** The change that was refused, in a few readable lines. */
  yours: { title: string; lines: readonly string[] };
  /** Save the same change again on top of the server's version. */
  onKeepMine: (baseVersion: number) => void;
  /** Drop the change and continue from the server's version. */
  onTakeTheirs: (current: Study) => void;
  busy?: boolean;
};

/** Shown when a save answers 409 `version_conflict`: both sides side by side, nothing lost. */
export function VersionConflict({ studyId, baseVersion, current, yours, onKeepMine, onTakeTheirs, busy }: VersionConflictProps) {
  const wide = useIsWide();
  const revisions = useRevisions(studyId);
  const { refetch } = revisions;
  // The cached history predates the other save.
  useEffect(() => {
    void refetch();
  }, [refetch, current.version]);
  const since = (revisions.data ?? []).filter((revision) => revision.number > baseVersion).reverse();

  return (
    <View role="alert" testID="version-conflict" style={styles.box}>
      <Text variant="heading">Someone saved first</Text>
      <Text>
        This study moved from version {baseVersion} to version {current.version} while you worked. Your change is not saved yet:
        keep it on top of their version, or take theirs.
      </Text>
      <View style={[styles.sides, wide && styles.sidesWide]}>
        <View style={[styles.side, wide && styles.sideWide]}>
          <Text variant="label" tone="muted">
            Saved meanwhile: version {current.version}
          </Text>
          <Text variant="bodyStrong">{current.title}</Text>
          <Text variant="caption" tone="faint">
            Last saved {formatDateTime(current.updatedAt)}
          </Text>
          {since.map((revision) => (
            <View key={revision.number} style={styles.revision}>
              <Text variant="caption" tone="muted">
                Revision {revision.number} by {revision.author?.name ?? 'a former member'}
              </Text>
              {revision.summary.map((line) => (
                <Text key={line} variant="mono" tone="muted">
                  {line}
                </Text>
              ))}
            </View>
          ))}
        </View>
        <View style={[styles.side, wide && styles.sideWide]}>
          <Text variant="label" tone="muted">
            Yours, not saved
          </Text>
          <Text variant="bodyStrong">{yours.title}</Text>
          {yours.lines.map((line) => (
            <Text key={line} variant="mono" tone="muted">
              {line}
            </Text>
          ))}
        </View>
      </View>
      <View style={styles.actions}>
        <Button label="Keep mine" onPress={() => onKeepMine(current.version)} busy={busy} />
        <Button label="Take theirs" variant="secondary" onPress={() => onTakeTheirs(current)} disabled={busy} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  box: {
    gap: spacing.md,
    padding: spacing.lg,
    borderRadius: radius.lg,
    borderWidth: 1,
    borderColor: color.warning,
    backgroundColor: color.warningSoft,
  },
  sides: { gap: spacing.md },
  sidesWide: { flexDirection: 'row' },
  side: { gap: spacing.xxs, padding: spacing.md, borderRadius: radius.md, backgroundColor: color.surface },
  sideWide: { flex: 1 },
  revision: { gap: spacing.xxs, marginTop: spacing.xs },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
