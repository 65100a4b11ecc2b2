import { useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Chip, Page, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { BackLink } from '@/features/studies/components/back-link';

import { FlatPlateDesign } from './components/flat-plate-design';
import { PlateFinDesign } from './components/plate-fin-design';

type Variant = 'plate-fin' | 'flat-plate';

/** A custom heatsink from its geometry: a plate-fin extrusion or a flat plate / copper area, estimated live, saved to the catalogue. */
export function SinkDesignScreen() {
  const [variant, setVariant] = useState<Variant>('plate-fin');
  return (
    <Page>
      <BackLink href="/heatsinks" label="Heatsinks" />
      <View style={styles.heading}>
        <Text variant="title">Design from geometry</Text>
        <Text tone="muted">
          Rθsa estimated from the dimensions with published correlations, with the assumptions and the checks that bound
          them. An estimate, not a measurement: confirm it on the bench.
        </Text>
      </View>
      <View role="radiogroup" aria-label="Kind of sink" style={styles.chips}>
        <Chip label="Plate-fin extrusion" selected={variant === 'plate-fin'} onPress={() => setVariant('plate-fin')} />
        <Chip label="Flat plate or PCB copper" selected={variant === 'flat-plate'} onPress={() => setVariant('flat-plate')} />
      </View>
      {variant === 'plate-fin' ? <PlateFinDesign /> : <FlatPlateDesign />}
    </Page>
  );
}

const styles = StyleSheet.create({
  heading: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
});
