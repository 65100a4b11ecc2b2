import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';

import type { Verdict } from '../verdict';

export type VerdictPanelProps = { verdict: Verdict; warnings: readonly string[] };

/** Warnings shown before "show all", so a long list does not push the curves off the screen. */
const FIRST_WARNINGS = 2;

/** The answer first: pass or fail in one sentence, then what qualifies it and the solver's warnings. */
export function VerdictPanel({ verdict, warnings }: VerdictPanelProps) {
  const [allWarnings, setAllWarnings] = useState(false);
  const shown = allWarnings ? warnings : warnings.slice(0, FIRST_WARNINGS);
  return (
    <View style={styles.wrap}>
      <View testID="study-verdict" style={[styles.box, verdict.passes ? styles.pass : styles.fail]}>
        <Text variant="heading" style={verdict.passes ? styles.passText : styles.failText}>
          {verdict.headline}
        </Text>
        {verdict.notes.map((note) => (
          <Text key={note} tone="muted">
            {note}
          </Text>
        ))}
      </View>
      {warnings.length > 0 ? (
        <View role="alert" style={[styles.box, styles.warnings]}>
          <Text variant="label" style={styles.warningTitle}>
            {warnings.length === 1 ? 'Solver warning' : `${warnings.length} solver warnings`}
          </Text>
          {shown.map((warning) => (
            <Text key={warning} variant="caption">
              {`• ${warning}`}
            </Text>
          ))}
          {warnings.length > FIRST_WARNINGS ? (
            <Button
              variant="ghost"
              label={allWarnings ? 'Show fewer warnings' : `Show all ${warnings.length} warnings`}
              onPress={() => setAllWarnings((a) => !a)}
              style={styles.more}
            />
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.sm },
  box: { gap: spacing.xs, padding: spacing.md, borderRadius: radius.md, borderLeftWidth: 4 },
  pass: { backgroundColor: color.successSoft, borderLeftColor: color.success },
  fail: { backgroundColor: color.dangerSoft, borderLeftColor: color.danger },
  passText: { color: color.success },
  failText: { color: color.danger },
  warnings: { backgroundColor: color.warningSoft, borderLeftColor: color.warning },
  warningTitle: { color: color.warning },
  more: { alignSelf: 'flex-start', minHeight: 32 },
});
