import { useFormik, type FormikProps } from 'formik';
import { Children, useRef, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { errorMessage, fieldErrors } from '@/api';
import { Button, Card, InlineAlert, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { BUILT_IN_DEFAULTS, type StudyDefaults } from '@/core/study';
import { TOUCH_CONTACTS, TOUCH_MATERIALS, touchLimitC } from '@/core/reliability';
import { ChoiceRow } from '@/features/study-editor/components/choice-row';
import { unitOf } from '@/features/study-editor/quantity-text';

import { conflictingSettings, useSaveTeamSettings } from '../api';
import { CONTACT_LABELS, defaultLines, MATERIAL_LABELS } from '../team-settings-lines';
import type { TeamSettings } from '../types';
import { DefaultsList } from './defaults-list';
import { formValuesFrom, QUANTITY_FIELDS, readFormValues, validateFormValues, type QuantityKey, type TeamSettingsFormValues } from '../team-settings-values';

type Form = FormikProps<TeamSettingsFormValues>;
type SourceKey = 'marginSource' | 'siteSource' | 'cyclingCoefficientSource' | 'cyclingExponentSource' | 'cyclingActivationSource' | 'arrheniusActivationSource' | 'touchSource';

const num = (n: number) => String(Number(n.toPrecision(6)));
const B = BUILT_IN_DEFAULTS;

function shownError(form: Form, field: keyof TeamSettingsFormValues): string | undefined {
  return form.touched[field] || form.submitCount > 0 ? (form.errors[field] as string | undefined) : undefined;
}

type QuantityProps = { form: Form; field: QuantityKey; label: string; unit?: string; builtIn?: string; hint?: string };

/** A default with its unit; empty leaves the built-in value (named in the placeholder) in force. */
function Quantity({ form, field, label, unit, builtIn, hint }: QuantityProps) {
  const u = unit ?? unitOf(QUANTITY_FIELDS[field]);
  return (
    <View style={styles.quantity}>
      <TextField
        label={u ? `${label} (${u})` : label}
        value={form.values[field]}
        onChangeText={form.handleChange(field)}
        onBlur={form.handleBlur(field)}
        placeholder={builtIn ? `${builtIn} (built in)` : 'not set'}
        error={shownError(form, field)}
        hint={hint}
        autoCapitalize="none"
        autoCorrect={false}
      />
    </View>
  );
}

function Source({ form, field, label = 'Source', hint }: { form: Form; field: SourceKey; label?: string; hint?: string }) {
  return (
    <View style={styles.source}>
      <TextField
        label={label}
        value={form.values[field]}
        onChangeText={form.handleChange(field)}
        onBlur={form.handleBlur(field)}
        placeholder="datasheet, report, team practice"
        error={shownError(form, field)}
        hint={hint}
      />
    </View>
  );
}

/** Fields side by side on a wide screen, one under the other on a phone. */
function Row({ children }: { children: React.ReactNode }) {
  const wide = useIsWide();
  if (!wide) return <View style={styles.column}>{children}</View>;
  // A flex basis only along a row: in a column it would set the height.
  return <View style={styles.row}>{Children.map(children, (child) => <View style={styles.cell}>{child}</View>)}</View>;
}

function Section({ title, note, children }: { title: string; note?: string; children: React.ReactNode }) {
  return (
    <Card>
      <Text variant="heading">{title}</Text>
      {note ? <Text tone="muted">{note}</Text> : null}
      <View style={styles.fields}>{children}</View>
    </Card>
  );
}

/** `version`: the version of `settings`, which a save is made on top of. */
export type TeamSettingsFormProps = { teamId: number; settings: StudyDefaults; version: number };

/** The owner's form over the team's defaults; values are checked with the study's own parsers. */
export function TeamSettingsForm({ teamId, settings, version }: TeamSettingsFormProps) {
  const save = useSaveTeamSettings(teamId);
  const [serverError, setServerError] = useState<string | null>(null);
  const [saved, setSaved] = useState(false);
  /** The version the form's changes are made on; moves on with each save and with "keep mine". */
  const base = useRef(version);
  /** Another owner's save that came first: the form keeps what was typed until the owner chooses. */
  const [conflict, setConflict] = useState<TeamSettings | null>(null);
  const form = useFormik<TeamSettingsFormValues>({
    initialValues: formValuesFrom(settings),
    validate: validateFormValues,
    onSubmit: async (values, helpers) => {
      setServerError(null);
      setSaved(false);
      setConflict(null);
      try {
        const next = await save.mutateAsync({ settings: readFormValues(values).settings, baseVersion: base.current });
        base.current = next.version;
        helpers.resetForm({ values: formValuesFrom(next.settings) });
        setSaved(true);
      } catch (error) {
        const current = conflictingSettings(error);
        if (current) {
          setConflict(current);
          return;
        }
        helpers.setErrors(fieldErrors(error));
        setServerError(errorMessage(error));
      }
    },
  });
  const v = form.values;
  const set = (field: keyof TeamSettingsFormValues, value: unknown) => {
    setSaved(false);
    void form.setFieldValue(field, value);
  };

  return (
    <View style={styles.form}>
      <Section title="Margin below Tj,max" note="Target junction temperature = Tj,max − margin.">
        <Row>
          <Quantity form={form} field="marginK" label="Margin" builtIn={`${B.marginK.value} K`} hint={`Built in: ${B.marginK.source}.`} />
          <Source form={form} field="marginSource" />
        </Row>
      </Section>

      <Section title="Site" note="Thinner air at altitude raises every sink's Rθsa. Empty: sea level.">
        <Row>
          <Quantity form={form} field="siteAltitudeM" label="Altitude" builtIn="0 m" hint="−500 m to about 11,000 m (U.S. Standard Atmosphere 1976)." />
          <Quantity form={form} field="siteRadiationShare" label="Radiation share" builtIn="0" hint="0–0.9 of each sink's conductance, which altitude leaves alone." />
        </Row>
        <Source form={form} field="siteSource" />
      </Section>

      <Section title="Life from temperature cycles" note="The power-cycling law Nf = A · ΔTj^(−α) · exp(Ea/(kB·Tjm)) and the Arrhenius reference. Empty fields keep the built-in values.">
        <ChoiceRow
          label="New studies"
          value={v.lifetimeInNewStudies ? 'on' : 'off'}
          options={[
            { value: 'on', label: 'Include a life estimate' },
            { value: 'off', label: 'Leave it out' },
          ]}
          onChange={(to) => set('lifetimeInNewStudies', to === 'on')}
        />
        <Quantity form={form} field="missionHoursPerDay" label="Hours a day" unit="h" hint="0–24 h of the study's profile a day; needed when new studies include a life estimate." />
        <Row>
          <Quantity form={form} field="cyclingCoefficient" label="Coefficient A" builtIn={num(B.cyclingCoefficient.value)} hint={`Built in: ${B.cyclingCoefficient.source}.`} />
          <Source form={form} field="cyclingCoefficientSource" label="Source of A" />
        </Row>
        <Row>
          <Quantity form={form} field="cyclingExponent" label="Exponent α" builtIn={num(B.cyclingExponent.value)} hint={`Built in: ${B.cyclingExponent.source}.`} />
          <Source form={form} field="cyclingExponentSource" label="Source of α" />
        </Row>
        <Row>
          <Quantity form={form} field="cyclingActivationEV" label="Activation energy Ea" unit="eV" builtIn={`${num(B.cyclingActivationEV.value)} eV`} hint={`Built in: ${B.cyclingActivationEV.source}.`} />
          <Source form={form} field="cyclingActivationSource" label="Source of Ea" />
        </Row>
        <Row>
          <Quantity form={form} field="arrheniusReferenceC" label="Arrhenius reference" hint="Reference of the time-weighted Arrhenius factor; empty: no factor." />
          <Quantity form={form} field="arrheniusActivationEV" label="Arrhenius Ea" unit="eV" builtIn={`${B.arrheniusActivationEV.value} eV`} hint={`Built in: ${B.arrheniusActivationEV.source}.`} />
        </Row>
        <Source form={form} field="arrheniusActivationSource" label="Source of the Arrhenius Ea" />
      </Section>

      <Section title="Touch temperature" note="Heatsinks of linear stages can run hot enough to burn. Safety standards and local codes decide; this check does not replace them.">
        <ChoiceRow
          label="New studies"
          value={v.touchRule}
          options={[
            { value: 'product', label: 'Not checked' },
            { value: 'table', label: 'By material and contact' },
            { value: 'limit', label: 'Own limit' },
          ]}
          onChange={(to) => set('touchRule', to)}
        />
        {v.touchRule === 'table' ? (
          <>
            <ChoiceRow label="Surface" value={v.touchMaterial} options={TOUCH_MATERIALS.map((m) => ({ value: m, label: MATERIAL_LABELS[m] }))} onChange={(to) => set('touchMaterial', to)} error={shownError(form, 'touchMaterial')} />
            <ChoiceRow label="Contact" value={v.touchContact} options={TOUCH_CONTACTS.map((c) => ({ value: c, label: CONTACT_LABELS[c] }))} onChange={(to) => set('touchContact', to)} error={shownError(form, 'touchContact')} />
            <Text variant="caption" tone="muted">
              {`Limit ${touchLimitC(v.touchMaterial, v.touchContact)} °C, after the touch-temperature table of IEC 62368-1 (class TS1) as recalled from memory: check it against the edition that applies.`}
            </Text>
          </>
        ) : null}
        {v.touchRule === 'limit' ? <Quantity form={form} field="touchLimitC" label="Limit" hint="Highest sink surface temperature allowed." /> : null}
        {v.touchRule !== 'product' ? <Source form={form} field="touchSource" /> : null}
      </Section>

      {serverError ? <InlineAlert message={serverError} /> : null}
      {conflict ? (
        <Card>
          <View style={styles.conflict} testID="team-settings-conflict">
            <InlineAlert
              message={`${conflict.updatedBy ? conflict.updatedBy.name : 'Another owner'} saved the team settings first (now version ${conflict.version}). Your changes are still in the form, not saved.`}
            />
            <DefaultsList lines={defaultLines(conflict.settings)} testID="team-settings-theirs" />
            <View style={styles.actions}>
              <Button
                label="Save mine over theirs"
                onPress={() => {
                  base.current = conflict.version;
                  setConflict(null);
                  form.handleSubmit();
                }}
              />
              <Button
                label="Take their values"
                variant="secondary"
                onPress={() => {
                  base.current = conflict.version;
                  form.resetForm({ values: formValuesFrom(conflict.settings) });
                  setConflict(null);
                }}
              />
            </View>
          </View>
        </Card>
      ) : null}
      {saved && !form.dirty ? <InlineAlert tone="info" message="Saved. Studies started from now on take these defaults; existing studies keep their values." /> : null}
      <View style={styles.actions}>
        <Button label="Save team settings" onPress={() => form.handleSubmit()} busy={form.isSubmitting} disabled={!form.dirty && !form.isSubmitting} />
        <Button label="Undo changes" variant="secondary" onPress={() => form.resetForm()} disabled={!form.dirty || form.isSubmitting} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  form: { gap: spacing.lg },
  fields: { gap: spacing.md, marginTop: spacing.xs },
  row: { flexDirection: 'row', gap: spacing.md, alignItems: 'flex-start' },
  column: { gap: spacing.md },
  cell: { flexGrow: 1, flexBasis: 0, minWidth: 160 },
  quantity: { maxWidth: 520 },
  source: { maxWidth: 520 },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  conflict: { gap: spacing.md },
});
