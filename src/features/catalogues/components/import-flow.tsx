import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Card, InlineAlert, LoadingState, PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useImportCsv, usePreviewImport } from '../api';
import { importFailure, type ImportFailure } from '../import-errors';
import { carryMapping, mappingProblems } from '../mapping';
import type { CatalogueResource, ImportMapping, ImportPreview, PickedFile } from '../types';
import { FilePicker } from './file-picker';
import { MappingStep } from './mapping-step';
import { PreviewTable } from './preview-table';
import { RowErrors } from './row-errors';

export type ImportFlowProps = {
  resource: CatalogueResource;
  /** Plural noun for messages: "heatsinks". */
  noun: string;
  teamId: number;
  teamName: string;
  withForcedAir?: boolean;
  libraryHref: '/heatsinks' | '/interface-materials';
};

type Outcome = { kind: 'imported'; count: number } | { kind: 'refused'; failure: ImportFailure } | null;

const kib = (bytes: number) => `${Math.max(1, Math.round(bytes / 1024))} KiB`;

/**
 * Choose a CSV file, check its first rows and the column mapping, then import: every row or,
 * on any problem, none; the problems come back by row and column to fix the file.
 */
export function ImportFlow({ resource, noun, teamId, teamName, withForcedAir, libraryHref }: ImportFlowProps) {
  const preview = usePreviewImport(resource);
  const importCsv = useImportCsv(resource);
  const [file, setFile] = useState<PickedFile | null>(null);
  const [shown, setShown] = useState<ImportPreview | null>(null);
  const [mapping, setMapping] = useState<ImportMapping | null>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const [readError, setReadError] = useState<string | null>(null);

  const labels = useMemo(() => Object.fromEntries((shown?.fields ?? []).map((f) => [f.field, f.label])), [shown]);
  const problems = mapping ? mappingProblems(mapping, labels) : [];

  const pick = async (picked: PickedFile) => {
    setOutcome(null);
    setReadError(null);
    try {
      const next = await preview.mutateAsync(picked);
      setMapping((m) => carryMapping(m, shown?.columns ?? [], next));
      setShown(next);
      setFile(picked);
    } catch (error) {
      setShown(null);
      setFile(null);
      setReadError(importFailure(error).message);
    }
  };

  const submit = async () => {
    if (!file || !mapping) return;
    setOutcome(null);
    try {
      const done = await importCsv.mutateAsync({ file, mapping, teamId });
      setOutcome({ kind: 'imported', count: done.imported });
    } catch (error) {
      setOutcome({ kind: 'refused', failure: importFailure(error) });
    }
  };

  const picker = (
    <FilePicker label={file ? 'Choose another file' : 'Choose a CSV file'} onPick={pick} disabled={preview.isPending || importCsv.isPending} />
  );

  return (
    <View style={styles.flow}>
      <Card>
        <Text variant="heading">1. File</Text>
        <Text tone="muted">
          A CSV file (comma, semicolon or tab separated, UTF-8, at most 1 MiB) with one header row. Nothing is saved until
          you press Import, and then every row is saved or none.
        </Text>
        <View style={styles.actions}>{picker}</View>
        {preview.isPending ? <LoadingState label="Reading the file…" /> : null}
        {readError ? <InlineAlert message={`The file could not be read, nothing was saved: ${readError}`} /> : null}
        {file && shown ? (
          <Text variant="caption" tone="muted">
            {file.name} · {kib(file.size)} · {shown.rowCount} {shown.rowCount === 1 ? 'row' : 'rows'} · separated by{' '}
            {shown.delimiter === '\t' ? 'tabs' : `"${shown.delimiter}"`}
          </Text>
        ) : null}
      </Card>

      {shown && mapping ? (
        <>
          <Card>
            <Text variant="heading">2. First rows</Text>
            <PreviewTable columns={shown.columns} rows={shown.firstRows} />
            {shown.rowCount > shown.firstRows.length ? (
              <Text variant="caption" tone="faint">
                The first {shown.firstRows.length} of {shown.rowCount} rows.
              </Text>
            ) : null}
          </Card>
          <Card>
            <Text variant="heading">3. Columns</Text>
            <MappingStep fields={shown.fields} columns={shown.columns} mapping={mapping} onChange={setMapping} withForcedAir={withForcedAir} />
          </Card>
          <Card>
            <Text variant="heading">4. Import</Text>
            {problems.map((p) => (
              <InlineAlert key={p} message={p} />
            ))}
            {outcome?.kind === 'refused' ? (
              <View role="alert" style={styles.refused}>
                <Text variant="bodyStrong" tone="danger">
                  Nothing was saved.
                </Text>
                <Text tone="danger">{outcome.failure.message.replace(/^Nothing was imported:\s*/, '')}</Text>
                {outcome.failure.rows.length ? <RowErrors errors={outcome.failure.rows} total={outcome.failure.total} /> : null}
                <Text tone="muted">Fix the file and choose it again; the column choices above are kept.</Text>
              </View>
            ) : null}
            {outcome?.kind === 'imported' ? (
              <View role="status" style={styles.imported}>
                <Text variant="bodyStrong" style={styles.importedText}>
                  Imported {outcome.count} {outcome.count === 1 ? noun.replace(/s$/, '') : noun} into {teamName}.
                </Text>
                <PressableLink href={libraryHref} style={styles.link}>
                  <Text variant="bodyStrong" tone="accent">
                    Back to the library
                  </Text>
                </PressableLink>
              </View>
            ) : (
              <View style={styles.actions}>
                <Button
                  label={`Import ${shown.rowCount} ${shown.rowCount === 1 ? 'row' : 'rows'}`}
                  onPress={submit}
                  busy={importCsv.isPending}
                  disabled={problems.length > 0 || Object.keys(mapping.fields).length === 0}
                />
                {picker}
              </View>
            )}
          </Card>
        </>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  flow: { gap: spacing.lg },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  refused: { gap: spacing.sm, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.danger, backgroundColor: color.dangerSoft },
  imported: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.success, backgroundColor: color.successSoft },
  importedText: { color: color.success },
  link: { alignSelf: 'flex-start', paddingVertical: spacing.xs },
});
