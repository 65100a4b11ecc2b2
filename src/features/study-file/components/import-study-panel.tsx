import { StyleSheet, View } from 'react-native';

import { Button, Card, InlineAlert, LoadingState, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';
import type { StudyDocument } from '@/core/study';

import type { StudyFileImport } from '../use-study-file-import';
import { StudyFilePicker } from './study-file-picker';

export type ImportStudyPanelProps = { importer: StudyFileImport; teamName: string };

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function contents(document: StudyDocument): string {
  const parts = [
    plural(document.devices.length, 'pass device entry', 'pass device entries'),
    plural(document.sinks.length, 'sink', 'sinks'),
    plural(document.profile.segments.length, 'profile segment', 'profile segments'),
  ];
  if (document.railPlan) parts.push(`a rail plan with ${plural(document.railPlan.taps.length, 'tap', 'taps')}`);
  return parts.join(', ');
}

/** The file picked for import: why it is refused, or what study it would create. */
export function ImportStudyPanel({ importer, teamName }: ImportStudyPanelProps) {
  const { state } = importer;
  if (state.kind === 'idle') return null;
  return (
    <Card testID="import-study" style={styles.card}>
      <View style={styles.head}>
        <Text variant="heading">Import study file</Text>
        <Text variant="mono" tone="faint">
          {state.fileName}
        </Text>
      </View>
      {state.kind === 'reading' ? <LoadingState label="Reading the file…" /> : null}
      {state.kind === 'checked' && state.check.kind !== 'ok' ? (
        <>
          <View role="alert" style={styles.problem}>
            <Text tone="danger">
              {state.check.kind === 'invalid' ? 'The study file has an error. Nothing was created.' : 'This file cannot be imported. Nothing was created.'}
            </Text>
            <Text variant={state.check.kind === 'invalid' ? 'mono' : 'body'} tone="muted">
              {state.check.message}
            </Text>
          </View>
          <View style={styles.actions}>
            <StudyFilePicker label="Choose another file" onPick={importer.pick} />
            <Button label="Close" variant="ghost" onPress={importer.close} />
          </View>
        </>
      ) : null}
      {state.kind === 'checked' && state.check.kind === 'ok' ? (
        <>
          <Text tone="muted">The file is a valid study. Create it as a new draft study in {teamName}?</Text>
          <View testID="import-study-preview" style={styles.preview}>
            <Text variant="bodyStrong">{state.check.title}</Text>
            <Text tone={state.check.description ? 'default' : 'muted'}>{state.check.description || 'No description.'}</Text>
            <Text variant="caption" tone="muted">
              {contents(state.check.parsed)}
            </Text>
          </View>
          {importer.createError ? <InlineAlert message={importer.createError} /> : null}
          <View style={styles.actions}>
            <Button label="Create study from file" onPress={importer.create} busy={importer.creating} />
            <Button label="Cancel" variant="secondary" onPress={importer.close} disabled={importer.creating} />
          </View>
        </>
      ) : null}
    </Card>
  );
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  head: { flexDirection: 'row', flexWrap: 'wrap', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.sm },
  problem: { gap: spacing.xs },
  preview: { gap: spacing.xxs, paddingLeft: spacing.md, borderLeftWidth: 2, borderLeftColor: color.borderStrong },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
