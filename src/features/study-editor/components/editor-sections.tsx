import { memo, useMemo } from 'react';
import { StyleSheet, View } from 'react-native';

import { spacing } from '@/constants/theme';

import type { Problem } from '../check-document';
import { SECTION_ORDER, SECTION_TITLES, sectionOf, type SectionKey } from '../field-path';
import { profileSteps } from '../profile-steps';
import type { EditorValues, RawProfile } from '../types';
import { railPlanSummary, type RawRailPlan } from '../rail-plan-edits';
import { formatDuration } from '@/features/studies/quantity-format';
import { AmbientSection } from './ambient-section';
import { DevicesSection } from './devices-section';
import { EditorSection } from './editor-section';
import { ProfileSection } from './profile-section';
import { RailPlanSection } from './rail-plan-section';
import { SiteLifeSection, siteLifeSummary } from './site-life-section';
import { StudyFields } from './study-fields';
import { ThermalSection } from './thermal-section';

export type EditorSectionsProps = {
  values: EditorValues;
  problems: readonly Problem[];
  open: Record<SectionKey, boolean>;
  onToggle: (key: SectionKey) => void;
  teamId: number;
};

const plural = (n: number, one: string, many: string) => `${n} ${n === 1 ? one : many}`;

function summaryOf(key: SectionKey, values: EditorValues): string {
  const doc = values.document;
  switch (key) {
    case 'study':
      return `Margin ${typeof doc.marginK === 'number' ? doc.marginK : 20} K below Tj,max${doc.mainsFed === true ? ', mains-fed' : ''}`;
    case 'devices':
      return (doc.devices ?? []).map((d) => d.id).join(', ') || 'none';
    case 'thermal':
      return `${plural((doc.sinks ?? []).length, 'sink', 'sinks')}${doc.enclosure ? ', enclosure' : ''}`;
    case 'ambient':
      return doc.ambient?.profile ? `${plural(doc.ambient.profile.length, 'point', 'points')} over time` : typeof doc.ambient?.temperatureC === 'number' ? `${doc.ambient.temperatureC} °C` : '—';
    case 'rails':
      return doc.railPlan ? railPlanSummary(doc.railPlan as RawRailPlan) : 'None';
    case 'site':
      return siteLifeSummary(doc);
    case 'profile':
      return profileSummary(doc.profile);
  }
}

function profileSummary(profile: RawProfile | undefined): string {
  const steps = profileSteps(profile);
  return `${plural(steps.segmentCount, 'segment', 'segments')}, ${formatDuration(steps.passS)} per pass`;
}

/** The editor's sections in order, each collapsible, each counting its problems. */
export const EditorSections = memo(function EditorSections({ values, problems, open, onToggle, teamId }: EditorSectionsProps) {
  const doc = values.document;
  const idsKey = JSON.stringify((doc.devices ?? []).map((d) => d.id ?? ''));
  // The same ids keep the same list, so the memoised sections below skip unrelated edits.
  const deviceIds = useMemo(() => JSON.parse(idsKey) as string[], [idsKey]);
  // A logged profile holds thousands of segments: its line is counted again only when it changes.
  const profileLine = useMemo(() => profileSummary(doc.profile), [doc.profile]);
  const body = (key: SectionKey) => {
    switch (key) {
      case 'study':
        return <StudyFields values={values} />;
      case 'devices':
        return <DevicesSection document={doc} teamId={teamId} />;
      case 'thermal':
        return <ThermalSection document={doc} teamId={teamId} />;
      case 'ambient':
        return <AmbientSection ambient={doc.ambient} />;
      case 'rails':
        return <RailPlanSection plan={doc.railPlan as RawRailPlan | undefined} deviceIds={deviceIds} />;
      case 'site':
        return <SiteLifeSection document={doc} />;
      case 'profile':
        return <ProfileSection profile={doc.profile} deviceIds={deviceIds} railPlan={doc.railPlan !== undefined} />;
    }
  };
  return (
    <View style={styles.list}>
      {SECTION_ORDER.map((key) => (
        <EditorSection
          key={key}
          title={SECTION_TITLES[key]}
          summary={key === 'profile' ? profileLine : summaryOf(key, values)}
          open={open[key]}
          onToggle={() => onToggle(key)}
          problems={problems.filter((p) => sectionOf(p.field) === key).length}
          testID={`section-${key}`}
        >
          {body(key)}
        </EditorSection>
      ))}
    </View>
  );
});

const styles = StyleSheet.create({
  list: { gap: spacing.md },
});
