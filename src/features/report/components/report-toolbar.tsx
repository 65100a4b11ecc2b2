import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { curvesCsv, curvesFileName } from '@/charts/curves-csv';
import { Button, InlineAlert, saveTextFile } from '@/components/ui';
import type { StudyResult } from '@/core/study';
import { spacing } from '@/constants/theme';
import { BackLink } from '@/features/studies/components/back-link';
import type { Study } from '@/features/studies/types';
import { DownloadStudyFileButton } from '@/features/study-file/components/download-study-file-button';

import { canPrint, printPage } from '../print-page';

export type ReportToolbarProps = { study: Study; result: StudyResult | null };

/** Back to the study, print, and the report's downloads; none of it is printed. */
export function ReportToolbar({ study, result }: ReportToolbarProps) {
  const [saveError, setSaveError] = useState<string | null>(null);
  const downloadCurves = async () => {
    if (!result) return;
    setSaveError(null);
    try {
      await saveTextFile(curvesFileName(study.title), curvesCsv(result.series ?? {}));
    } catch (error) {
      setSaveError(`The CSV could not be saved: ${error instanceof Error ? error.message : String(error)}`);
    }
  };
  return (
    <View testID="report-toolbar" style={styles.toolbar}>
      <BackLink href={`/studies/${study.id}`} label="Study" />
      <View style={styles.actions}>
        {canPrint ? <Button label="Print" onPress={printPage} /> : null}
        <Button label="Download curves (CSV)" variant="secondary" onPress={downloadCurves} disabled={!result?.series} />
        <DownloadStudyFileButton study={study} label="Download study file (JSON)" />
      </View>
      {saveError ? <InlineAlert message={saveError} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  toolbar: { gap: spacing.sm },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
