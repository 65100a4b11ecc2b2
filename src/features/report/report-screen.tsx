import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, errorStatus } from '@/api';
import { EmptyState, ErrorState, InlineAlert, LoadingState, Page, Text, useIsWide } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { useStudyResult } from '@/features/results/use-study-result';
import { useStudy } from '@/features/studies/api';
import { BackLink } from '@/features/studies/components/back-link';
import { readStudyDocument } from '@/features/studies/study-document';
import type { Study } from '@/features/studies/types';

import { PrintStyles } from './components/print-styles';
import { ReportApprovals } from './components/report-approvals';
import { ReportAssumptions } from './components/report-assumptions';
import { ReportCautions } from './components/report-cautions';
import { ReportComments } from './components/report-comments';
import { ReportHeader } from './components/report-header';
import { ReportInputs } from './components/report-inputs';
import { ReportResults } from './components/report-results';
import { ReportSection } from './components/report-section';
import { ReportToolbar } from './components/report-toolbar';

function ReportBody({ study, printedAt }: { study: Study; printedAt: string }) {
  const wide = useIsWide();
  const inputs = readStudyDocument(study.document);
  const solved = useStudyResult(study.document);
  const result = solved.kind === 'ok' ? solved.result : null;
  return (
    <>
      <PrintStyles />
      <ReportToolbar study={study} result={result} />
      <View testID="report" style={[styles.report, wide && styles.reportWide]}>
        <ReportHeader study={study} printedAt={printedAt} />
        <ReportApprovals study={study} />
        {inputs.kind === 'ok' ? (
          <ReportInputs document={inputs.document} raw={study.document} />
        ) : (
          <ReportSection name="inputs" title="Inputs">
            {inputs.kind === 'empty' ? (
              <Text tone="muted">No design inputs have been saved in this study yet.</Text>
            ) : (
              <View role="alert" style={styles.invalid}>
                <Text tone="danger">The saved document could not be read.</Text>
                <Text variant="mono" tone="muted">
                  {inputs.message}
                </Text>
              </View>
            )}
          </ReportSection>
        )}
        {inputs.kind === 'ok' ? <ReportAssumptions document={inputs.document} raw={study.document} result={result} /> : null}
        {solved.kind === 'ok' ? (
          <ReportResults result={solved.result} />
        ) : solved.kind === 'solving' ? (
          <ReportSection name="results" title="Results">
            <LoadingState label="Solving the study…" />
          </ReportSection>
        ) : solved.kind === 'failed' ? (
          <ReportSection name="results" title="Results">
            <InlineAlert message={`The study could not be solved: ${solved.message}`} />
          </ReportSection>
        ) : solved.kind === 'invalid' ? (
          <ReportSection name="results" title="Results">
            <Text tone="muted">No results: the saved document could not be read (see the inputs).</Text>
          </ReportSection>
        ) : null}
        <ReportCautions result={result} document={study.document} />
        <ReportComments studyId={study.id} />
      </View>
    </>
  );
}

export type ReportScreenProps = { id: string };

/**
 * A printable report of one study for review and records: the study and its approval, the
 * inputs, the assumptions, the results, the cautions, and the comments as an appendix.
 */
export function ReportScreen({ id }: ReportScreenProps) {
  const study = useStudy(id);
  const [printedAt] = useState(() => new Date().toISOString());

  if (study.isPending) {
    return (
      <Page width="readable">
        <LoadingState label="Loading the study…" />
      </Page>
    );
  }
  if (study.isError) {
    return (
      <Page width="readable">
        <BackLink href="/" label="Studies" />
        {errorStatus(study.error) === 404 ? (
          <EmptyState title="Study not found" message="It may have been deleted, or it belongs to a team you are not a member of." />
        ) : (
          <ErrorState
            title="Could not load the study"
            message={errorMessage(study.error)}
            onRetry={() => study.refetch()}
            retrying={study.isFetching}
          />
        )}
      </Page>
    );
  }
  return (
    <Page width="readable">
      <ReportBody study={study.data} printedAt={printedAt} />
    </Page>
  );
}

const styles = StyleSheet.create({
  // The report reads as a sheet of paper; printing drops the sheet's frame.
  report: {
    gap: spacing.xl,
    padding: spacing.lg,
    backgroundColor: color.surface,
    borderWidth: 1,
    borderColor: color.border,
    borderRadius: radius.lg,
  },
  reportWide: { padding: spacing.xxl },
  invalid: { gap: spacing.xs },
});
