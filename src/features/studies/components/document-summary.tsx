import { StyleSheet, View } from 'react-native';

import { Card, Text } from '@/components/ui';
import { color, spacing } from '@/constants/theme';

import { outlineDocument } from '../document-outline';

export type DocumentSummaryProps = { document: unknown };

/** What the saved design document contains, section by section; read-only. */
export function DocumentSummary({ document }: DocumentSummaryProps) {
  const outline = outlineDocument(document);
  return (
    <Card>
      <View style={styles.head}>
        <Text variant="heading">Design document</Text>
        {outline.formatVersion ? (
          <Text variant="mono" tone="faint">
            format v{outline.formatVersion}
          </Text>
        ) : null}
      </View>
      {outline.entries.length === 0 ? (
        <Text tone="muted">No design inputs have been saved in this study yet.</Text>
      ) : (
        <View role="list" style={styles.list}>
          {outline.entries.map((entry, index) => (
            <View
              key={entry.key}
              role="listitem"
              style={[styles.row, index < outline.entries.length - 1 && styles.divider]}
            >
              <Text variant="bodyStrong" style={styles.label}>
                {entry.label}
              </Text>
              <Text variant="mono" tone="muted" style={styles.detail}>
                {entry.detail}
              </Text>
            </View>
          ))}
        </View>
      )}
    </Card>
  );
}

const styles = StyleSheet.create({
  head: { flexDirection: 'row', justifyContent: 'space-between', alignItems: 'baseline', gap: spacing.md },
  list: { marginTop: spacing.xs },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md, paddingVertical: spacing.sm },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  label: { flexBasis: 160, flexGrow: 1 },
  detail: { flexGrow: 2, flexShrink: 1 },
});
