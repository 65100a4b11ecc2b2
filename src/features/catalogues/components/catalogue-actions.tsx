import { useRouter, type Href } from 'expo-router';
import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, InlineAlert } from '@/components/ui';
import { spacing } from '@/constants/theme';

import { downloadCatalogueCsv } from '../api';
import type { CatalogueResource } from '../types';

export type CatalogueActionsProps = {
  resource: CatalogueResource;
  teamId: number | undefined;
  canEdit: boolean;
  newLabel: string;
  newHref: Href;
  importHref: Href;
};

/** New entry and CSV import for editors; CSV export for everyone who reads the catalogue. */
export function CatalogueActions({ resource, teamId, canEdit, newLabel, newHref, importHref }: CatalogueActionsProps) {
  const router = useRouter();
  const [exporting, setExporting] = useState(false);
  const [error, setError] = useState<string | null>(null);
  const exportCsv = async () => {
    setExporting(true);
    setError(null);
    try {
      await downloadCatalogueCsv(resource, teamId);
    } catch (e) {
      setError(`The export could not be downloaded: ${e instanceof Error ? e.message : String(e)}`);
    } finally {
      setExporting(false);
    }
  };
  return (
    <View style={styles.wrap}>
      <View style={styles.actions}>
        {canEdit ? <Button label={newLabel} onPress={() => router.push(newHref)} /> : null}
        {canEdit ? <Button label="Import CSV" variant="secondary" onPress={() => router.push(importHref)} /> : null}
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
