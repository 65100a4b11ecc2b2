import { Pressable, StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import { useEditorActions } from '../editor-context';
import type { EditorValues } from '../types';
import { QuantityField } from './quantity-field';
import { TeamDefaultsNote } from './team-defaults-note';
import { TextEntry } from './text-entry';

export type StudyFieldsProps = { values: EditorValues };

/** The `mainsFed` flag as a checkbox; unticking removes the field (not stated) rather than writing false. */
function MainsFedBox({ checked }: { checked: boolean }) {
  const { set } = useEditorActions();
  return (
    <Pressable
      role="checkbox"
      aria-checked={checked}
      accessibilityState={{ checked }}
      accessibilityLabel="Mains-fed"
      onPress={() => set('document.mainsFed', checked ? undefined : true)}
      style={({ pressed }) => [styles.check, pressed && styles.pressed]}
    >
      <View style={[styles.box, checked && styles.boxOn]}>{checked ? <Text style={styles.tick}>✓</Text> : null}</View>
      <View style={styles.checkText}>
        <Text variant="label">Mains-fed</Text>
        <Text variant="caption" tone="muted">
          The supply is fed from the mains: the results and report add the mains-wiring caution.
        </Text>
      </View>
    </Pressable>
  );
}

/** Title, description, the mains flag and the margin the junctions must keep below Tj,max. */
export function StudyFields({ values }: StudyFieldsProps) {
  return (
    <View style={styles.fields}>
      <TextEntry field="title" mirror="document.title" value={values.title} label="Title" size="full" />
      <TextEntry field="description" mirror="document.description" value={values.description} label="Description" multiline size="full" />
      <MainsFedBox checked={values.document.mainsFed === true} />
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
  fields: { gap: spacing.md },
  margin: { maxWidth: 360 },
  check: { flexDirection: 'row', alignItems: 'flex-start', gap: spacing.sm, minHeight: 44, paddingVertical: spacing.xs },
  pressed: { opacity: 0.7 },
  box: {
    width: 22,
    height: 22,
    marginTop: 1,
    borderRadius: radius.sm,
    borderWidth: 1.5,
    borderColor: color.borderStrong,
    backgroundColor: color.surface,
    alignItems: 'center',
    justifyContent: 'center',
  },
  boxOn: { backgroundColor: color.accent, borderColor: color.accent },
  tick: { color: color.surface, fontSize: 14, lineHeight: 16 },
  checkText: { flex: 1, gap: 2 },
});
