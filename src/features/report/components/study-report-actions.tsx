import { useRouter } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Button } from '@/components/ui';
import { spacing } from '@/constants/theme';
import type { Study } from '@/features/studies/types';
import { DownloadStudyFileButton } from '@/features/study-file/components/download-study-file-button';

export type StudyReportActionsProps = { study: Study };

/** On the study view: open the printable report, or save the study as a file. */
export function StudyReportActions({ study }: StudyReportActionsProps) {
  const router = useRouter();
  return (
    <View style={styles.actions}>
      <Button label="Report" variant="secondary" onPress={() => router.push(`/studies/${study.id}/report`)} />
      <DownloadStudyFileButton study={study} />
    </View>
  );
}

const styles = StyleSheet.create({
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
