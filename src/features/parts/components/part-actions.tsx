import { useRouter } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, InlineAlert } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { downloadPartsCsv } from '../api';

export type PartActionsProps = { teamId: number | undefined; canEdit: boolean };

/** New part and CSV import for editors; CSV export for everyone who reads the library. */
export function PartActions({ teamId, canEdit }: PartActionsProps) {
  const router = useRouter();
  const [exporting, setExporting] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const exportCsv = async () => {
    setExporting(true);
    setError(null);
    try {
      await downloadPartsCsv(teamId);
    } catch (e) {
      setError(`The export could not be downloaded: ${e instanceof Error ? e.message : String(e)}`);
    } finally {
      setExporting(false);
    }
  };
  return (
    <View style={styles.wrap}>
      <View style={styles.actions}>
        {canEdit ? <Button label="New part" onPress={() => router.push('/parts/new')} /> : null}
        {canEdit ? <Button label="Import CSV" variant="secondary" onPress={() => router.push('/parts/import')} /> : null}
        <Button label="Export CSV" variant="secondary" onPress={exportCsv} busy={exporting} />
      </View>
      {error ? <InlineAlert message={error} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm, flexShrink: 1, maxWidth: '100%' },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
