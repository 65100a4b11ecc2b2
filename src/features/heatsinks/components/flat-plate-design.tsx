import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Card, Chip, InlineAlert, Text, useIsWide } from '@/components/ui';
import type { SinkMaterial } from '@/core/heatsink';
import { spacing } from '@/constants/theme';
import { TwoColumns } from '@/features/results/components/two-columns';
import { FactGrid } from '@/features/studies/components/fact-grid';
import { formatQuantity } from '@/features/studies/quantity-format';

import { DEMO_FLAT_PLATE, DEMO_FLAT_PLATE_MATERIAL, DEMO_PLATE_CONDITION, estimateFlatPlate, FLAT_PLATE_FIELDS, type FlatPlateDesign as Design, type FlatPlateKey } from '../flat-plate-estimate';
import { flatPlateCatalogueBody } from '../geometry-catalogue';
import { formatMass } from '../heatsink-format';
import { EstimateNotes } from './estimate-notes';
import { GeometryField } from './geometry-field';
import { NaturalConditionFields } from './natural-condition-fields';
import { MaterialChips } from './plate-fin-design';
import { SaveEstimate } from './save-estimate';

const KEYS = Object.keys(FLAT_PLATE_FIELDS) as FlatPlateKey[];

function Estimate({ d }: { d: Design }) {
  const n = d.natural;
  const facts = [
    { label: 'Convection h', value: formatQuantity(n.convectionHWPerM2K, 'W/(m²·K)') },
    { label: 'Radiation h', value: formatQuantity(n.radiationHWPerM2K, 'W/(m²·K)') },
    { label: 'Spreading efficiency', value: formatQuantity(n.spreadingEfficiency * 100, '%') },
    { label: 'Mass', value: formatMass(d.massKg) },
    { label: 'Heat capacity', value: formatQuantity(n.capacityJPerK, 'J/K') },
  ];
  return (
    <View style={styles.estimate}>
      <View testID="flat-plate-estimate" style={styles.headline}>
        <Text variant="label" tone="muted">
          Rθsa in still air
        </Text>
        <Text variant="title">{formatQuantity(n.rsaKPerW, 'K/W')}</Text>
        <Text tone="muted">{`isothermal plate shedding ${formatQuantity(d.powerW, 'W')} at a ${formatQuantity(n.riseK, 'K')} rise above ${formatQuantity(n.ambientC, '°C')}`}</Text>
        <Text>{`With the spreading in the metal: about ${formatQuantity(n.rsaWithSpreadingKPerW, 'K/W')} (fed along its centre line).`}</Text>
      </View>
      <EstimateNotes title="Plate estimate" notes={n} />
      <FactGrid facts={facts} />
    </View>
  );
}

/** A vertical flat plate or PCB copper area as a sink: still-air Rθsa with its spreading penalty; save it to the catalogue. */
export function FlatPlateDesign() {
  const [texts, setTexts] = useState<Record<FlatPlateKey, string>>(DEMO_FLAT_PLATE);
  const [material, setMaterial] = useState<SinkMaterial>(DEMO_FLAT_PLATE_MATERIAL);
  const [faces, setFaces] = useState<1 | 2>(2);
  const [condition, setCondition] = useState(DEMO_PLATE_CONDITION);
  const wide = useIsWide();
  const outcome = useMemo(() => estimateFlatPlate(texts, material, faces, condition), [texts, material, faces, condition]);
  const errors = outcome.ok ? {} : outcome.errors;

  const form = (
    <Card style={styles.card}>
      <Text variant="heading">Plate or copper area</Text>
      <Text variant="caption" tone="muted">
        Held vertical; lengths in mm unless you type a unit (1 oz copper is 35 µm).
      </Text>
      <View style={styles.row}>
        {KEYS.map((k) => (
          <GeometryField key={k} spec={FLAT_PLATE_FIELDS[k]} value={texts[k]} onChange={(t) => setTexts((s) => ({ ...s, [k]: t }))} error={errors[k]} />
        ))}
      </View>
      <MaterialChips value={material} onChange={setMaterial} />
      <View style={styles.choice}>
        <Text variant="label" tone="muted">
          Faces shedding heat
        </Text>
        <View role="radiogroup" aria-label="Faces shedding heat" style={styles.chips}>
          <Chip label="Both faces" selected={faces === 2} onPress={() => setFaces(2)} />
          <Chip label="One face" selected={faces === 1} onPress={() => setFaces(1)} />
        </View>
      </View>
      <Text variant="heading">Conditions</Text>
      <NaturalConditionFields value={condition} onChange={setCondition} errors={errors} />
      {errors.form ? <InlineAlert message={errors.form} /> : null}
      {!wide && outcome.ok ? (
        <Text variant="bodyStrong" tone="accent">{`Rθsa in still air ${formatQuantity(outcome.estimate.natural.rsaKPerW, 'K/W')}: the estimate follows below.`}</Text>
      ) : null}
    </Card>
  );
  const result = (
    <Card style={styles.card}>
      <Text variant="heading">Estimate</Text>
      {outcome.ok ? <Estimate d={outcome.estimate} /> : <Text tone="muted">Fix the fields marked in red to see the estimate.</Text>}
      <SaveEstimate
        defaultName={`Custom ${material} plate ${texts.height} × ${texts.width} mm (estimate)`}
        body={outcome.ok ? (name, rise, teamId) => flatPlateCatalogueBody(name, outcome.estimate, rise, teamId) : null}
      />
    </Card>
  );
  return <TwoColumns firstShare={0.45}>{[form, result]}</TwoColumns>;
}

const styles = StyleSheet.create({
  card: { gap: spacing.md },
  row: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.md },
  choice: { gap: spacing.xs },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.xs },
  estimate: { gap: spacing.md },
  headline: { gap: spacing.xxs },
});
