import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text, TextField, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { numberOrNull } from '@/features/catalogues/form-values';
import { formatNumber } from '@/features/studies/quantity-format';

import { exponentFit } from '../exponent-fit';

export type ExponentFitProps = {
  /** The form's still-air rating, as typed. */
  rthKPerW: string;
  referenceRiseK: string;
  /** Writes the fitted exponent into the form's field. */
  onUse: (text: string) => void;
};

/** A second still-air rating of the same sink (a maker's curve read at another rise), fitted to n. */
export function ExponentFit({ rthKPerW, referenceRiseK, onUse }: ExponentFitProps) {
  const wide = useIsWide();
  const [open, setOpen] = useState(false);
  const [rth, setRth] = useState('');
  const [rise, setRise] = useState('');

  if (!open) return <Button label="Fit n from a second still-air rating" variant="ghost" style={styles.start} onPress={() => setOpen(true)} />;

  const fit = exponentFit({ rthKPerW: numberOrNull(rthKPerW), riseK: numberOrNull(referenceRiseK) }, { rthKPerW: numberOrNull(rth), riseK: numberOrNull(rise) });
  return (
    <View style={styles.wrap}>
      <Text variant="label" tone="muted">
        Second still-air rating of this sink
      </Text>
      <View style={styles.fields}>
        <View style={[styles.cell, wide && styles.half]}>
          <TextField label="Rθsa (K/W)" accessibilityLabel="Rθsa of the second rating, K/W" value={rth} inputMode="decimal" onChangeText={setRth} error={fit.kind === 'bad' && fit.field === 'rthKPerW' ? fit.message : undefined} />
        </View>
        <View style={[styles.cell, wide && styles.half]}>
          <TextField label="At a rise of (K)" accessibilityLabel="Rise of the second rating, K" value={rise} inputMode="decimal" onChangeText={setRise} error={fit.kind === 'bad' && fit.field === 'riseK' ? fit.message : undefined} />
        </View>
      </View>
      <Text variant="caption" tone={fit.kind === 'fit' && fit.inRange ? 'default' : 'muted'} role="status">
        {fit.kind === 'fit'
          ? fit.inRange
            ? `n = ${formatNumber(fit.exponent)} through ${rthKPerW} K/W at ${referenceRiseK} K and ${rth} K/W at ${rise} K.`
            : `n = ${formatNumber(fit.exponent)} lies outside 0…1: check both ratings (Rθsa should fall as the rise grows).`
          : fit.kind === 'bad' && fit.field === 'reference'
            ? fit.message
            : 'Both ratings are fitted by Rθsa × (reference rise / rise)^n.'}
      </Text>
      <View style={styles.row}>
        {fit.kind === 'fit' && fit.inRange ? <Button label={`Use n = ${formatNumber(fit.exponent)}`} onPress={() => onUse(String(Number(fit.exponent.toFixed(3))))} /> : null}
        <Button label="Close" variant="ghost" onPress={() => setOpen(false)} />
      </View>
    </View>
  );
}

const styles = StyleSheet.create({
  start: { alignSelf: 'flex-start' },
  wrap: { gap: spacing.sm },
  row: { flexDirection: 'row', flexWrap: 'wrap', alignItems: 'flex-start', gap: spacing.sm },
  // Lined up with the form's two-column grid on wide screens.
  fields: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.md },
  cell: { width: '100%' },
  half: { width: '48%' },
});
