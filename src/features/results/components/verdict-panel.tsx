import { StyleSheet, View } from 'react-native';

import { Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import type { Verdict } from '../verdict';

export type VerdictPanelProps = { verdict: Verdict; warnings: readonly string[] };

/** The answer first: pass or fail in one sentence, then what qualifies it. */
export function VerdictPanel({ verdict, warnings }: VerdictPanelProps) {
  return (
    <View testID="study-verdict" style={[styles.box, verdict.passes ? styles.pass : styles.fail]}>
      <Text variant="heading" style={verdict.passes ? styles.passText : styles.failText}>
        {verdict.headline}
      </Text>
      {verdict.notes.map((note) => (
        <Text key={note} tone="muted">
          {note}
        </Text>
      ))}
      {warnings.length > 0 ? (
        <View role="alert" style={styles.warnings}>
          <Text variant="label" style={styles.warningText}>
            Solver warnings
          </Text>
          {warnings.map((warning) => (
            <Text key={warning} style={styles.warningText}>
              {warning}
            </Text>
          ))}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderLeftWidth: 4 },
  pass: { backgroundColor: color.successSoft, borderLeftColor: color.success },
  fail: { backgroundColor: color.dangerSoft, borderLeftColor: color.danger },
  passText: { color: color.success },
  failText: { color: color.danger },
  warnings: { gap: spacing.xxs, marginTop: spacing.xs, paddingTop: spacing.xs, borderTopWidth: 1, borderTopColor: color.warning },
  warningText: { color: color.warning },
});
