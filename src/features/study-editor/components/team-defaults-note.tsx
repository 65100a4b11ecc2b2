import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useTeamDefaults } from '../editor-context';
import type { RawDocument } from '../types';

/** Reads a form field (`document.site.altitudeM`) out of the document. */
function valueAt(doc: RawDocument, field: string): unknown {
  let at: unknown = doc;
  for (const key of field.replace(/^document\./, '').split('.')) {
    at = at && typeof at === 'object' ? (at as Record<string, unknown>)[key] : undefined;
  }
  return at;
}

const NAMES: Record<string, string> = {
  'document.marginK': 'margin',
  'document.site.altitudeM': 'site altitude',
  'document.site.radiationShare': 'radiation share',
  'document.lifetime.mission.hoursPerDay': 'hours a day',
  'document.lifetime.powerCycling.coefficient': 'power-cycling A',
  'document.lifetime.powerCycling.exponent': 'power-cycling α',
  'document.lifetime.powerCycling.activationEnergyEV': 'power-cycling Ea',
  'document.lifetime.arrhenius.referenceC': 'Arrhenius reference',
  'document.lifetime.arrhenius.activationEnergyEV': 'Arrhenius Ea',
  'document.touch.limitC': 'touch limit',
  'document.touch.material': 'touch surface',
  'document.touch.contact': 'touch contact',
};

/** Which values of the study still are the ones it took from the team's defaults when it was started. */
export function TeamDefaultsNote({ document: doc }: { document: RawDocument }) {
  const defaults = useTeamDefaults();
  const kept = [...defaults].filter(([field, d]) => valueAt(doc, field) === d.value);
  if (kept.length === 0) return null;
  const sources = [...new Set(kept.map(([, d]) => d.source))];
  return (
    <View style={styles.note} testID="team-defaults-note">
      <Text variant="caption" tone="muted">
        {`From the team's defaults: ${kept.map(([field]) => NAMES[field] ?? field.replace(/^document\./, '')).join(', ')} (sources: ${sources.join('; ')}). They were written into this study when it was started; changing the team settings later does not change it.`}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  note: { borderLeftWidth: 3, borderLeftColor: color.info, borderRadius: radius.sm, paddingLeft: spacing.sm, paddingVertical: spacing.xxs },
});
