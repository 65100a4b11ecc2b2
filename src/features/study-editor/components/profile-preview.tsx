import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { ProfileChart, type ProfileChartSeries } from '@/charts/profile-chart';
import { Chip, Text } from '@/components/ui';
import { formatDuration } from '@/features/studies/quantity-format';
import { spacing } from '@/constants/theme';

import { profileSteps } from '../profile-steps';
import type { RawProfile } from '../types';

export type ProfilePreviewProps = { profile: RawProfile | undefined; deviceIds: string[] };

/** The profile of one pass as a chart of current or power against time, with its counts. */
export function ProfilePreview({ profile, deviceIds }: ProfilePreviewProps) {
  const steps = useMemo(() => profileSteps(profile), [profile]);
  const hasCurrent = steps.steps.some((s) => s.currentA !== null);
  const hasPower = steps.steps.some((s) => Object.keys(s.powerW).length > 0);
  const [choice, setChoice] = useState<'current' | 'power' | null>(null);
  const mode = choice ?? (hasCurrent || !hasPower ? 'current' : 'power');

  const series = useMemo<ProfileChartSeries[]>(() => {
    if (mode === 'current') {
      return [{ key: 'iload', label: 'Load current', steps: steps.steps.map((s) => ({ startS: s.startS, endS: s.endS, value: s.currentA ?? 0 })) }];
    }
    return deviceIds.map((id) => ({ key: id, label: `${id}, per part`, steps: steps.steps.map((s) => ({ startS: s.startS, endS: s.endS, value: s.powerW[id] ?? 0 })) }));
  }, [mode, steps, deviceIds]);

  const repeat = typeof profile?.repeat === 'number' ? profile.repeat : 1;
  return (
    <View style={styles.box}>
      <Text testID="profile-summary">
        {steps.segmentCount.toLocaleString('en')} {steps.segmentCount === 1 ? 'segment' : 'segments'} per pass, one pass {formatDuration(steps.passS)}
        {repeat > 1 ? `, ${repeat} passes` : ''}
        {profile?.periodic ? ', periodic steady state' : ''}
      </Text>
      {hasCurrent && hasPower ? (
        <View role="radiogroup" aria-label="Chart shows" style={styles.chips}>
          <Chip label="Load current" selected={mode === 'current'} onPress={() => setChoice('current')} />
          <Chip label="Power per device" selected={mode === 'power'} onPress={() => setChoice('power')} />
        </View>
      ) : null}
      {steps.passS > 0 ? (
        <ProfileChart series={series} unit={mode === 'current' ? 'A' : 'W'} durationS={steps.passS} label={`Load profile: ${mode === 'current' ? 'load current' : 'power per part'} against time`} />
      ) : null}
      {steps.incomplete ? (
        <Text variant="caption" tone="faint">
          Durations or repeats not yet given count as zero (or once) here.
        </Text>
      ) : null}
      {steps.truncated ? (
        <Text variant="caption" tone="faint">
          The chart shows the first {steps.steps.length.toLocaleString('en')} segments.
        </Text>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
});
