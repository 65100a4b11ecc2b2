import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Card, InlineAlert, LoadingState, PressableLink, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { FilePicker } from '@/features/catalogues/components/file-picker';
import { MappingStep } from '@/features/catalogues/components/mapping-step';
import { PreviewTable } from '@/features/catalogues/components/preview-table';
import { RowErrors } from '@/features/catalogues/components/row-errors';
import { importFailure, type ImportFailure } from '@/features/catalogues/import-errors';
import { carryMapping, mappingProblems } from '@/features/catalogues/mapping';
import type { ImportField, ImportMapping, ImportPreview, PickedFile } from '@/features/catalogues/types';

import { useImportParts, usePreviewPartImport } from '../api';

export type PartImportFlowProps = { teamId: number; teamName: string };

type Outcome = { kind: 'imported'; count: number } | { kind: 'refused'; failure: ImportFailure } | null;

/** The Rθjc column: the server reads it into a one-Rθjc thermal model (`rthJcKPerW: { column }`). */
const RTH_FIELD: ImportField = { field: 'rthJcKPerW', label: 'Rθjc (K/W)', kind: 'number' };

const kib = (bytes: number) => `${Math.max(1, Math.round(bytes / 1024))} KiB`;

/** The preview with the Rθjc column among the fields, so the mapping step offers it. */
const withRth = (p: ImportPreview): ImportPreview => (p.fields.some((f) => f.field === RTH_FIELD.field) ? p : { ...p, fields: [...p.fields, RTH_FIELD] });

/**
 * The catalogue import for parts: choose a CSV file, check its first rows and the columns
 * (Rθjc among them), then import every row or, on any problem, none.
 */
export function PartImportFlow({ teamId, teamName }: PartImportFlowProps) {
  const preview = usePreviewPartImport();
  const importCsv = useImportParts();
  const [file, setFile] = useState<PickedFile | null>(null);
  const [shown, setShown] = useState<ImportPreview | null>(null);
  const [mapping, setMapping] = useState<ImportMapping | null>(null);
  const [outcome, setOutcome] = useState<Outcome>(null);
  const [readError, setReadError] = useState<string | null>(null);

  const labels = useMemo(() => Object.fromEntries((shown?.fields ?? []).map((f) => [f.field, f.label])), [shown]);
  const problems = mapping ? mappingProblems(mapping, labels) : [];
  if (mapping && !mapping.fields.rthJcKPerW) problems.push('Choose the column that holds Rθjc: every part needs its junction-to-case resistance.');

  const pick = async (picked: PickedFile) => {
    setOutcome(null);
    setReadError(null);
    try {
      const next = withRth(await preview.mutateAsync(picked));
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

  const picker = <FilePicker label={file ? 'Choose another file' : 'Choose a CSV file'} onPick={pick} disabled={preview.isPending || importCsv.isPending} />;

  return (
    <View style={styles.flow}>
      <Card>
        <Text variant="heading">1. File</Text>
        <Text tone="muted">
          A CSV file (comma, semicolon or tab separated, UTF-8, at most 1 MiB) with one header row: name, kind, package, Tj,max and Rθjc per
          part. Each part gets one Rθjc as its thermal model; Foster or Cauer values, Zth fits, electrical and SOA models are added in the
          part’s form. Nothing is saved until you press Import, and then every row is saved or none.
        </Text>
        <View style={styles.actions}>{picker}</View>
        {preview.isPending ? <LoadingState label="Reading the file…" /> : null}
        {readError ? <InlineAlert message={`The file could not be read, nothing was saved: ${readError}`} /> : null}
        {file && shown ? (
          <Text variant="caption" tone="muted">
            {file.name} · {kib(file.size)} · {shown.rowCount} {shown.rowCount === 1 ? 'row' : 'rows'} · separated by {shown.delimiter === '\t' ? 'tabs' : `"${shown.delimiter}"`}
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
            <MappingStep fields={shown.fields} columns={shown.columns} mapping={mapping} onChange={setMapping} />
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
                  Imported {outcome.count} {outcome.count === 1 ? 'part' : 'parts'} into {teamName}.
                </Text>
                <PressableLink href="/parts" style={styles.link}>
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
                  disabled={problems.length > 0}
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
