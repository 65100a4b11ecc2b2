import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { spacing } from '@/constants/theme';

import type { EditorValues } from '../types';
import { QuantityField } from './quantity-field';
import { TeamDefaultsNote } from './team-defaults-note';
import { TextEntry } from './text-entry';

export type StudyFieldsProps = { values: EditorValues };

/** Title, description and the margin the junctions must keep below Tj,max. */
export function StudyFields({ values }: StudyFieldsProps) {
  return (
    <View style={styles.box}>
      <TextEntry field="title" mirror="document.title" value={values.title} label="Title" size="full" />
      <TextEntry field="description" mirror="document.description" value={values.description} label="Description" multiline size="full" />
      <View style={styles.margin}>
        <QuantityField
          field="document.marginK"
          value={values.document.marginK}
          kind="temperatureDifference"
          label="Margin below Tj,max"
          optional
          placeholder="20 K"
          hint="Target junction temperature = Tj,max − margin; 20–25 K is common practice. Empty: 20 K."
          size="full"
        />
      </View>
      <TeamDefaultsNote document={values.document} />
      <Text variant="caption" tone="faint">
        Format {String(values.document.format ?? '—')} v{String(values.document.version ?? '—')}
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md },
  margin: { maxWidth: 360 },
});
