import { useQueryClient } from '@tanstack/react-query';
import { useFormik } from 'formik';
import { memo, useCallback, useEffect, useMemo, useRef, useState } from 'react';
import { ScrollView, StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, ConfirmRow, InlineAlert, useIsWide } from '@/components/ui';
import { color, size, spacing } from '@/constants/theme';
import { StudyResults } from '@/features/results/study-results';
import { studyKey } from '@/features/studies/api';
import { BackLink } from '@/features/studies/components/back-link';
import { VersionConflict } from '@/features/studies/components/version-conflict';
import type { Study } from '@/features/studies/types';
import { conflictingStudy } from '@/features/studies/version-conflict';

import { useSaveStudy } from './api';
import type { Problem } from './check-document';
import { DraftBanner } from './components/draft-banner';
import { EditorHeader } from './components/editor-header';
import { EditorSections } from './components/editor-sections';
import { LiveVerdictPanel } from './components/live-verdict-panel';
import { ProblemList } from './components/problem-list';
import { changeLines } from './document-changes';
import { clearDrafts, findDraft, saveDraft, type Draft } from './draft-storage';
import { EditorProvider, type EditorActions, type FieldMeta } from './editor-context';
import { saveBody, valuesFromStudy } from './editor-values';
import { SECTION_ORDER, sectionOf, type SectionKey } from './field-path';
import { teamDefaultFields } from './team-default-fields';
import type { EditorValues, RawDocument } from './types';
import { checkValues, useEditorCheck } from './use-editor-check';
import { useLiveVerdict } from './use-live-verdict';

/**
 * Chart points per node of the live results: min and max per bucket keep every peak, and a
 * results column is well under 800 px wide, so more points would not show (the saved study's
 * own view uses the core's default).
 */
const LIVE_SERIES_POINTS = 800;

/** How long edits wait before they are kept on the device, ms. */
const DRAFT_DELAY_MS = 400;

type Conflict = { baseVersion: number; current: Study; sent: EditorValues };

const allSections = (open: boolean) => Object.fromEntries(SECTION_ORDER.map((k) => [k, open])) as Record<SectionKey, boolean>;
const sameJson = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);

export type EditorFormProps = { study: Study };

/**
 * The study editor: the document as a formik form, checked by the study parser a moment after
 * each change, solved live, kept on the device until saved, saved against the version it
 * started from.
 */
export function EditorForm({ study }: EditorFormProps) {
  const wide = useIsWide();
  const queryClient = useQueryClient();
  const save = useSaveStudy(study.id);
  const [initial] = useState(() => valuesFromStudy(study));
  const [baseVersion, setBaseVersion] = useState(study.version);
  const [offer, setOffer] = useState<Draft | null>(() => {
    const draft = findDraft(study.id);
    return draft && !sameJson(draft.values, initial) ? draft : null;
  });
  const [conflict, setConflict] = useState<Conflict | null>(null);
  const [serverProblem, setServerProblem] = useState<{ problem: Problem; values: EditorValues } | null>(null);
  const [saveError, setSaveError] = useState<string | null>(null);
  const [savedVersion, setSavedVersion] = useState<number | null>(null);
  const [discarding, setDiscarding] = useState(false);
  const [open, setOpen] = useState(() => allSections(wide));
  const [resultsOpen, setResultsOpen] = useState(false);

  const form = useFormik<EditorValues>({ initialValues: initial, onSubmit: () => undefined, validateOnChange: false, validateOnBlur: false });
  const { values, dirty, setFieldValue, resetForm, setValues } = form;

  const fields = useRef(new Map<string, FieldMeta>());
  const actions = useMemo<EditorActions>(
    () => ({
      set: (field, value) => void setFieldValue(field, value, false),
      update: (field, change) => void setFieldValue(field, (current: never) => change(current), false),
      register: (field, meta) => {
        fields.current.set(field, meta);
        return () => {
          if (fields.current.get(field) === meta) fields.current.delete(field);
        };
      },
    }),
    [setFieldValue],
  );

  const teamDefaults = useMemo(() => teamDefaultFields(study.teamDefaults), [study.teamDefaults]);
  const check = useEditorCheck(values, fields, form.initialValues);
  const lastGood = check.lastGood;

  // A server finding holds for the values it was about, until the next edit.
  const server = serverProblem && serverProblem.values === values ? serverProblem.problem : null;
  const problems = useMemo(() => {
    const list = [...check.problems];
    if (server && !list.some((p) => p.field === server.field)) list.unshift(server);
    return list;
  }, [check.problems, server]);
  const errors = useMemo(() => {
    const map = new Map<string, string>();
    for (const p of problems) if (!map.has(p.field)) map.set(p.field, p.reason);
    return map;
  }, [problems]);

  const phoneVerdict = useLiveVerdict(lastGood?.raw ?? null, !wide && !resultsOpen);

  // Unsaved edits are kept on the device; while a kept draft is on offer, it is not overwritten.
  useEffect(() => {
    if (offer) return;
    if (!dirty) {
      clearDrafts(study.id);
      return;
    }
    const timer = setTimeout(() => saveDraft({ studyId: study.id, baseVersion, savedAt: new Date().toISOString(), values }), DRAFT_DELAY_MS);
    return () => clearTimeout(timer);
  }, [values, dirty, offer, baseVersion, study.id]);

  // A stable toggle lets the memoised sections skip renders that change nothing in them.
  const toggleSection = useCallback((k: SectionKey) => setOpen((o) => ({ ...o, [k]: !o[k] })), []);
  const openSection = (field: string) => setOpen((o) => ({ ...o, [sectionOf(field)]: true }));

  const send = (sent: EditorValues, base: number) => {
    setSaveError(null);
    setServerProblem(null);
    save.mutate(saveBody(sent, base), {
      onSuccess: (saved) => {
        clearDrafts(study.id);
        setConflict(null);
        setBaseVersion(saved.version);
        setSavedVersion(saved.version);
        resetForm({ values: valuesFromStudy(saved) });
      },
      onError: (error) => {
        const current = conflictingStudy(error);
        if (current) {
          setConflict({ baseVersion: base, current, sent });
          return;
        }
        const [first] = Object.entries(fieldErrors(error));
        if (first) {
          setServerProblem({ problem: { field: first[0], reason: first[1] }, values: sent });
          openSection(first[0]);
        }
        setSaveError(`Not saved: ${errorMessage(error)}`);
      },
    });
  };

  const onSave = () => {
    const now = checkValues(values, fields.current, form.initialValues);
    if (now.problems.length > 0) {
      openSection(now.problems[0].field);
      setSaveError(`Not saved: fix the ${now.problems.length === 1 ? 'problem' : `${now.problems.length} problems`} listed above first. Your edits are kept on this device.`);
      return;
    }
    send(values, baseVersion);
  };

  const takeTheirs = (current: Study) => {
    queryClient.setQueryData(studyKey(String(study.id)), current);
    clearDrafts(study.id);
    setConflict(null);
    setBaseVersion(current.version);
    resetForm({ values: valuesFromStudy(current) });
  };

  const allOpen = SECTION_ORDER.every((k) => open[k]);
  const header = (
    <View style={styles.header}>
      <BackLink href={`/studies/${study.id}`} label="Back to the study" />
      <EditorHeader
        study={study}
        title={values.title}
        baseVersion={baseVersion}
        dirty={dirty}
        savedVersion={savedVersion}
        saving={save.isPending}
        allOpen={allOpen}
        onSave={onSave}
        onDiscard={() => setDiscarding(true)}
        onToggleAll={() => setOpen(allSections(!allOpen))}
      />
      {discarding ? (
        <ConfirmRow
          message={`Discard your unsaved changes? The editor goes back to version ${baseVersion} as saved.`}
          confirmLabel="Discard"
          onConfirm={() => {
            resetForm();
            clearDrafts(study.id);
            setDiscarding(false);
          }}
          onCancel={() => setDiscarding(false)}
        />
      ) : null}
      {offer ? (
        <DraftBanner
          draft={offer}
          currentVersion={study.version}
          onRestore={() => {
            setValues(offer.values, false);
            setBaseVersion(offer.baseVersion);
            setOffer(null);
          }}
          onDiscard={() => {
            clearDrafts(study.id);
            setOffer(null);
          }}
        />
      ) : null}
      {conflict ? (
        <VersionConflict
          studyId={study.id}
          baseVersion={conflict.baseVersion}
          current={conflict.current}
          yours={{ title: conflict.sent.title, lines: changeLines(valuesFromStudy(conflict.current).document, conflict.sent.document, 'document') }}
          busy={save.isPending}
          onKeepMine={(base) => {
            setBaseVersion(base);
            send(values, base);
          }}
          onTakeTheirs={takeTheirs}
        />
      ) : null}
      {saveError && !conflict ? <InlineAlert message={saveError} /> : null}
      <ProblemList problems={problems} labelOf={(field) => fields.current.get(field)?.label ?? (field === 'title' ? 'Title' : undefined)} onSelect={openSection} />
    </View>
  );

  const sections = <EditorSections values={values} problems={problems} open={open} onToggle={toggleSection} teamId={study.teamId} />;
  const stale = check.parsed === null;

  return (
    <EditorProvider actions={actions} errors={errors} defaults={teamDefaults}>
      {wide ? (
        <View style={styles.wideRoot}>
          <View style={styles.wideHeader}>{header}</View>
          <View style={styles.columns}>
            <ScrollView style={styles.editorColumn} contentContainerStyle={styles.columnContent} keyboardShouldPersistTaps="handled">
              {sections}
            </ScrollView>
            <ScrollView style={styles.resultsColumn} contentContainerStyle={styles.columnContent} testID="live-results">
              <LiveResults raw={lastGood?.raw ?? null} stale={stale} />
            </ScrollView>
          </View>
        </View>
      ) : (
        <ScrollView contentContainerStyle={styles.phone} keyboardShouldPersistTaps="handled">
          {header}
          <View style={styles.phoneResults}>
            {resultsOpen ? null : <LiveVerdictPanel state={phoneVerdict} stale={stale} />}
          </View>
          <PhoneResults open={resultsOpen} onToggle={() => setResultsOpen((o) => !o)} raw={lastGood?.raw ?? null} stale={stale} />
          {sections}
        </ScrollView>
      )}
    </EditorProvider>
  );
}

/** Drawn again only when the checked document or its staleness changes, not on each keystroke. */
const LiveResults = memo(function LiveResults({ raw, stale }: { raw: RawDocument | null; stale: boolean }) {
  return (
    <View style={styles.live}>
      {stale ? <InlineAlert tone="info" message={raw ? 'Results are from the last inputs without problems; fix the problems listed to update them.' : 'Results appear once the inputs have no problems.'} /> : null}
      {raw ? <StudyResults document={raw} seriesPoints={LIVE_SERIES_POINTS} verdictFirst /> : null}
    </View>
  );
});

/** On a phone the full results (chart, tables) open on request; the verdict line stays above. */
function PhoneResults({ open, onToggle, raw, stale }: { open: boolean; onToggle: () => void; raw: RawDocument | null; stale: boolean }) {
  return (
    <View style={styles.live}>
      <Button label={open ? 'Hide the full results' : 'Show the full results: curves, tables, events'} variant="secondary" onPress={onToggle} style={styles.toggle} />
      {open ? <LiveResults raw={raw} stale={stale} /> : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wideRoot: { flex: 1 },
  wideHeader: { paddingHorizontal: spacing.xl, paddingTop: spacing.lg, paddingBottom: spacing.md, borderBottomWidth: 1, borderBottomColor: color.border, backgroundColor: color.canvas },
  header: { gap: spacing.md, maxWidth: size.contentMaxWidth + 200, width: '100%', alignSelf: 'center' },
  columns: { flex: 1, flexDirection: 'row' },
  editorColumn: { flexGrow: 3, flexShrink: 1, flexBasis: 0 },
  resultsColumn: { flexGrow: 2, flexShrink: 1, flexBasis: 0, borderLeftWidth: 1, borderLeftColor: color.border },
  columnContent: { padding: spacing.lg, gap: spacing.md },
  phone: { paddingHorizontal: spacing.lg, paddingVertical: spacing.xl, gap: spacing.md },
  phoneResults: { gap: spacing.sm },
  live: { gap: spacing.md },
  toggle: { alignSelf: 'flex-start' },
});
