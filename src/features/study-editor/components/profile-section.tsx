import { memo, useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Chip, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import type { LogSegment } from '../csv-log';
import { useEditorActions } from '../editor-context';
import { editText } from '../quantity-text';
import { isElectrical, isGroup, type RawItem, type RawProfile, type RawSegment } from '../types';
import { CsvImport } from './csv-import';
import { ProfilePreview } from './profile-preview';
import { PulseTrainForm } from './pulse-train-form';
import { QuantityField } from './quantity-field';
import { RampForm } from './ramp-form';
import { SegmentList } from './segment-list';

type Helper = 'pulses' | 'ramp' | 'csv' | null;

/** Vin and Vout of the last operating point, to hold in a helper's new segments. */
function heldLevels(items: readonly RawItem[]): { vin: string; vout: string } {
  const flat: RawSegment[] = [];
  const walk = (list: readonly RawItem[]) => list.forEach((i) => (isGroup(i) ? walk(i.segments ?? []) : flat.push(i)));
  walk(items);
  const last = flat.reverse().find(isElectrical);
  const text = (v: unknown) => (typeof v === 'number' ? editText(v, 'voltage') : '');
  return { vin: text(last?.vinV), vout: text(last?.voutV) };
}

export type ProfileSectionProps = { profile: RawProfile | undefined; deviceIds: string[]; railPlan: boolean };

/** The load over time: segments and groups, helpers that append to them, passes and periodic state. */
export const ProfileSection = memo(function ProfileSection({ profile = {}, deviceIds, railPlan }: ProfileSectionProps) {
  const { set, update } = useEditorActions();
  const [helper, setHelper] = useState<Helper>(null);
  const ids = deviceIds.join(',');
  const stableIds = useMemo(() => (ids ? ids.split(',') : []), [ids]);
  const items = profile.segments ?? [];
  const append = (added: RawItem[]) => {
    update<RawItem[] | undefined>('document.profile.segments', (list) => [...(list ?? []), ...added]);
    setHelper(null);
  };
  const toggle = (h: Exclude<Helper, null>) => setHelper((current) => (current === h ? null : h));

  return (
    <View style={styles.box}>
      <ProfilePreview profile={profile} deviceIds={stableIds} />
      <View style={styles.row}>
        <QuantityField field="document.profile.repeat" value={profile.repeat} kind="integer" label="Passes" fullLabel="Profile passes" optional placeholder="1" hint="Run one after the other; empty: 1." />
        <View style={styles.periodic}>
          <Text variant="label" tone="muted">
            Report
          </Text>
          <View role="radiogroup" aria-label="Report" style={styles.chips}>
            <Chip label="From a cold start" selected={!profile.periodic} onPress={() => set('document.profile.periodic', undefined)} />
            <Chip label="Periodic steady state" selected={Boolean(profile.periodic)} onPress={() => set('document.profile.periodic', true)} />
          </View>
        </View>
      </View>

      {railPlan ? (
        <Text variant="caption" tone="muted">
          With the rail plan, operating points give Vout and Iload: the input comes from the tap the plan selects.
        </Text>
      ) : null}
      <SegmentList field="document.profile.segments" items={items} deviceIds={ids} railPlan={railPlan} />

      <View style={styles.helpers}>
        <Text variant="label" tone="muted" style={styles.title}>
          Add several at once
        </Text>
        <View style={styles.chips}>
          <Button label="Pulse train" variant={helper === 'pulses' ? 'primary' : 'secondary'} onPress={() => toggle('pulses')} />
          <Button label="Ramp" variant={helper === 'ramp' ? 'primary' : 'secondary'} onPress={() => toggle('ramp')} />
          <Button label="Import CSV log" variant={helper === 'csv' ? 'primary' : 'secondary'} onPress={() => toggle('csv')} />
        </View>
        {helper === 'pulses' ? <PulseTrainForm deviceIds={stableIds} railPlan={railPlan} held={heldLevels(items)} onAppend={(g) => append([g])} onClose={() => setHelper(null)} /> : null}
        {helper === 'ramp' ? <RampForm deviceIds={stableIds} railPlan={railPlan} held={heldLevels(items)} onAppend={append} onClose={() => setHelper(null)} /> : null}
        {helper === 'csv' ? (
          <CsvImport
            deviceIds={stableIds}
            railPlan={railPlan}
            onClose={() => setHelper(null)}
            onApply={(segments: LogSegment[], mode) => {
              if (mode === 'replace') {
                set('document.profile.segments', segments);
                setHelper(null);
              } else append(segments);
            }}
          />
        ) : null}
      </View>
    </View>
  );
});

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.lg },
  periodic: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  helpers: { gap: spacing.sm, paddingTop: spacing.md, borderTopWidth: 1, borderTopColor: color.border },
  title: { textTransform: 'uppercase', letterSpacing: 0.6 },
});
