import { memo } from 'react';
import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { TOUCH_CONTACTS, TOUCH_MATERIALS, touchLimitC, type TouchContact, type TouchMaterial } from '@/core/reliability';

import { useEditorActions, useErrorsUnder } from '../editor-context';
import type { RawDocument, RawObject } from '../types';
import { ChoiceRow } from './choice-row';
import { QuantityField } from './quantity-field';

const SITE = [
  { value: 'sea', label: 'Sea level' },
  { value: 'set', label: 'At an altitude' },
] as const;
const MISSION = [
  { value: 'off', label: 'Not estimated' },
  { value: 'hours', label: 'Hours a day' },
  { value: 'repeats', label: 'Repeats a day' },
] as const;
const TOUCH = [
  { value: 'off', label: 'Not checked' },
  { value: 'table', label: 'By material and contact' },
  { value: 'limit', label: 'Own limit' },
] as const;
const MATERIAL_LABELS: Record<TouchMaterial, string> = { metal: 'Metal', glass: 'Glass', plastic: 'Plastic', wood: 'Wood' };
const CONTACT_LABELS: Record<TouchContact, string> = { brief: 'Up to 10 s', short: 'Up to 1 min', long: 'Up to 8 h', continuous: 'Longer' };

const obj = (v: unknown): RawObject | undefined => (v && typeof v === 'object' && !Array.isArray(v) ? (v as RawObject) : undefined);

export type SiteLifeSectionProps = { document: RawDocument };

/** It reads only the site, the lifetime, the touch limit and whether the profile is periodic: an edit elsewhere leaves it as drawn. */
const sameSiteLifeTouch = ({ document: a }: SiteLifeSectionProps, { document: b }: SiteLifeSectionProps) =>
  a.site === b.site && a.lifetime === b.lifetime && a.touch === b.touch && a.profile?.periodic === b.profile?.periodic;

/** Site altitude, the mission for the life estimate and the touch-temperature limit (docs/study-format.md). */
export const SiteLifeSection = memo(function SiteLifeSection({ document: doc }: SiteLifeSectionProps) {
  const { set } = useEditorActions();
  const site = obj(doc.site);
  const lifetime = obj(doc.lifetime);
  const mission = obj(lifetime?.mission);
  const touch = obj(doc.touch);
  const missionKind = !lifetime ? 'off' : mission?.repeatsPerDay !== undefined ? 'repeats' : 'hours';
  const touchKind = !touch ? 'off' : touch.limitC !== undefined ? 'limit' : 'table';
  const material = (TOUCH_MATERIALS as readonly string[]).includes(String(touch?.material)) ? (touch!.material as TouchMaterial) : 'metal';
  const contact = (TOUCH_CONTACTS as readonly string[]).includes(String(touch?.contact)) ? (touch!.contact as TouchContact) : 'brief';
  const otherErrors = [...useErrorsUnder('document.lifetime'), ...useErrorsUnder('document.touch')].filter(
    (e) => !['document.lifetime.mission.hoursPerDay', 'document.lifetime.mission.repeatsPerDay', 'document.touch.limitC'].includes(e.field),
  );
  // The editor keeps what it does not show (power-cycling law, Arrhenius reference, per-sink rules).
  const { limitC: _limit, material: _material, contact: _contact, ...touchRest } = touch ?? {};

  return (
    <View style={styles.box}>
      <ChoiceRow
        label="Site"
        value={site ? 'set' : 'sea'}
        options={SITE}
        onChange={(to) => set('document.site', to === 'sea' ? undefined : { ...site, altitudeM: site?.altitudeM ?? '' })}
      />
      {site ? (
        <View style={styles.field}>
          <QuantityField field="document.site.altitudeM" value={site.altitudeM} kind="length" label="Altitude" fullLabel="Site altitude" hint="Thinner air: every sink's Rθsa is raised for it." />
        </View>
      ) : null}

      <ChoiceRow
        label="Life from temperature cycles"
        value={missionKind}
        options={MISSION}
        onChange={(to) => {
          if (to === missionKind) return;
          if (to === 'off') return set('document.lifetime', undefined);
          set('document.lifetime', { ...lifetime, mission: to === 'hours' ? { hoursPerDay: 8 } : { repeatsPerDay: 1 } });
        }}
      />
      {missionKind === 'hours' ? (
        <View style={styles.field}>
          <QuantityField field="document.lifetime.mission.hoursPerDay" value={mission?.hoursPerDay} kind="number" label="Hours a day" fullLabel="Mission hours a day" hint="0–24 h of this profile a day" />
        </View>
      ) : null}
      {missionKind === 'repeats' ? (
        <View style={styles.field}>
          <QuantityField field="document.lifetime.mission.repeatsPerDay" value={mission?.repeatsPerDay} kind="number" label="Repeats a day" fullLabel="Mission repeats a day" hint="Whole runs of the profile a day" />
        </View>
      ) : null}
      {lifetime && doc.profile?.periodic === true ? (
        <View style={styles.field}>
          <QuantityField
            field="document.lifetime.mission.startsPerDay"
            value={mission?.startsPerDay}
            kind="number"
            label="Cold starts a day"
            optional
            placeholder="0"
            hint="Each adds a cycle from the ambient to the period's peak"
          />
        </View>
      ) : null}

      <ChoiceRow
        label="Touch temperature"
        value={touchKind}
        options={TOUCH}
        onChange={(to) => {
          if (to === touchKind) return;
          if (to === 'off') return set('document.touch', undefined);
          set('document.touch', to === 'limit' ? { ...touchRest, limitC: 60 } : { ...touchRest, material: 'metal', contact: 'brief' });
        }}
      />
      {touchKind === 'table' ? (
        <>
          <ChoiceRow
            label="Surface"
            value={material}
            options={TOUCH_MATERIALS.map((m) => ({ value: m, label: MATERIAL_LABELS[m] }))}
            onChange={(to) => set('document.touch.material', to)}
          />
          <ChoiceRow
            label="Contact"
            value={contact}
            options={TOUCH_CONTACTS.map((c) => ({ value: c, label: CONTACT_LABELS[c] }))}
            onChange={(to) => set('document.touch.contact', to)}
          />
          <Text variant="caption" tone="muted">
            {`Limit ${touchLimitC(material, contact)} °C, after the touch-temperature table of IEC 62368-1 as recalled from memory: check it against the standard that applies.`}
          </Text>
        </>
      ) : null}
      {touchKind === 'limit' ? (
        <View style={styles.field}>
          <QuantityField field="document.touch.limitC" value={touch?.limitC} kind="temperature" label="Limit" fullLabel="Touch limit" hint="Highest sink surface temperature allowed" />
        </View>
      ) : null}
      {otherErrors.map((e) => (
        <Text key={e.field} variant="caption" tone="danger" role="alert">
          {`${e.field.replace(/^document\./, '')}: ${e.reason}`}
        </Text>
      ))}
    </View>
  );
}, sameSiteLifeTouch);

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  field: { flexDirection: 'row', maxWidth: 320 },
});

/** The section's one-line summary: what of the three is set. */
export function siteLifeSummary(doc: RawDocument): string {
  const site = obj(doc.site);
  const mission = obj(obj(doc.lifetime)?.mission);
  const touch = obj(doc.touch);
  const parts = [
    site && typeof site.altitudeM === 'number' ? `${site.altitudeM} m` : 'sea level',
    !mission ? 'no life estimate' : typeof mission.hoursPerDay === 'number' ? `${mission.hoursPerDay} h a day` : typeof mission.repeatsPerDay === 'number' ? `${mission.repeatsPerDay} repeats a day` : 'life estimate',
    !touch ? 'touch not checked' : typeof touch.limitC === 'number' ? `touch ≤ ${touch.limitC} °C` : 'touch by material',
  ];
  return parts.join(', ');
}
