import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { FinScanChart } from '@/charts/fin-scan-chart';
import { Card, Chip, InlineAlert, Text, useIsWide } from '@/components/ui';
import type { SinkMaterial } from '@/core/heatsink';
import { spacing } from '@/constants/theme';
import { TwoColumns } from '@/features/results/components/two-columns';
import { FactGrid } from '@/features/studies/components/fact-grid';
import { formatQuantity } from '@/features/studies/quantity-format';

import { mergeNotes } from '../check-format';
import { plateFinCatalogueBody } from '../geometry-catalogue';
import { formatMass } from '../heatsink-format';
import { DEMO_CONDITION, DEMO_PLATE_FIN, DEMO_PLATE_FIN_MATERIAL, estimatePlateFin, PLATE_FIN_FIELDS, type PlateFinEstimate, type PlateFinKey } from '../plate-fin-estimate';
import { formatVolume } from '../ranking-text';
import { EstimateNotes } from './estimate-notes';
import { GeometryField } from './geometry-field';
import { NaturalConditionFields } from './natural-condition-fields';
import { SaveEstimate } from './save-estimate';

const KEYS = Object.keys(PLATE_FIN_FIELDS) as PlateFinKey[];
const mmText = (m: number) => formatQuantity(m * 1e3, 'mm');

export function MaterialChips({ value, onChange }: { value: SinkMaterial; onChange: (m: SinkMaterial) => void }) {
  return (
    <View style={styles.choice}>
      <Text variant="label" tone="muted">
        Material
      </Text>
      <View role="radiogroup" aria-label="Material" style={styles.chips}>
        <Chip label="Aluminium" selected={value === 'aluminium'} onPress={() => onChange('aluminium')} />
        <Chip label="Copper" selected={value === 'copper'} onPress={() => onChange('copper')} />
      </View>
    </View>
  );
}

function Estimate({ e }: { e: PlateFinEstimate }) {
  const n = e.natural;
  const forcedNotes = mergeNotes(e.forced.map((f) => ({ notes: f, label: formatQuantity(f.airSpeedMPerS, 'm/s') })));
  const facts = [
    { label: 'Fin spacing', value: `${mmText(n.spacingM)} (optimum ${mmText(n.optimumSpacingM)})` },
    { label: 'Channel h', value: formatQuantity(n.channelHWPerM2K, 'W/(m²·K)') },
    { label: 'Fin efficiency', value: formatQuantity(n.finEfficiency * 100, '%') },
    { label: 'Radiation share', value: formatQuantity((n.radiationWPerK / (n.radiationWPerK + n.convectionWPerK)) * 100, '%') },
    { label: 'Mass', value: formatMass(e.massKg) },
    { label: 'Heat capacity', value: formatQuantity(e.capacityJPerK, 'J/K') },
    { label: 'Envelope volume', value: formatVolume(e.envelopeVolumeM3) },
  ];
  return (
    <View style={styles.estimate}>
      <View testID="plate-fin-estimate" style={styles.headline}>
        <Text variant="label" tone="muted">
          Rθsa in still air
        </Text>
        <Text variant="title">{formatQuantity(n.rsaKPerW, 'K/W')}</Text>
        <Text tone="muted">{`shedding ${formatQuantity(e.powerW, 'W')} at a ${formatQuantity(n.riseK, 'K')} rise above ${formatQuantity(n.ambientC, '°C')}`}</Text>
      </View>
      <EstimateNotes title="Still-air estimate" notes={n} />
      <FactGrid facts={facts} />
      {e.forced.length > 0 ? (
        <View style={styles.block}>
          <Text variant="label" tone="muted">
            Forced air along the fins
          </Text>
          <View role="list" aria-label="Forced-air estimates">
            {e.forced.map((f) => (
              <Text key={f.airSpeedMPerS} role="listitem" tone={f.withinRange ? 'default' : 'danger'}>
                {`${formatQuantity(f.airSpeedMPerS, 'm/s')}: Rθsa ${formatQuantity(f.rsaKPerW, 'K/W')}${f.withinRange ? '' : ' (a check is out of range, see below)'}`}
              </Text>
            ))}
          </View>
          <EstimateNotes title="Forced-air estimates" notes={forcedNotes} />
        </View>
      ) : null}
      {e.scan ? (
        <View style={styles.block}>
          <Text variant="label" tone="muted">
            Fin count
          </Text>
          <Text testID="fin-scan-best">
            {`At this rise ${e.scan.best.finCount} fins give the lowest Rθsa, ${formatQuantity(e.scan.best.rsaKPerW, 'K/W')} (spacing ${mmText(e.scan.best.spacingM)}); the analytic optimum spacing ${mmText(e.scan.optimumSpacingM)} points to ${e.scan.finCountForOptimumSpacing}.`}
          </Text>
          <FinScanChart
            rows={e.scan.table}
            current={e.geometry.finCount}
            best={e.scan.best.finCount}
            label={`Still-air Rθsa against fin count; ${e.geometry.finCount} fins now, ${e.scan.best.finCount} best`}
          />
          <Text variant="caption" tone="faint">
            Ring: the fin count of this design. Dot: the lowest Rθsa. Everything else is held as entered.
          </Text>
        </View>
      ) : null}
    </View>
  );
}

/** A plate-fin extrusion from its dimensions: live still-air and forced-air estimates, heat capacity, the best fin count; save it to the catalogue. */
export function PlateFinDesign() {
  const [texts, setTexts] = useState<Record<PlateFinKey, string>>(DEMO_PLATE_FIN);
  const [material, setMaterial] = useState<SinkMaterial>(DEMO_PLATE_FIN_MATERIAL);
  const [condition, setCondition] = useState(DEMO_CONDITION);
  const wide = useIsWide();
  const outcome = useMemo(() => estimatePlateFin(texts, material, condition), [texts, material, condition]);
  const errors = outcome.ok ? {} : outcome.errors;
  const defaultName = `Custom extrusion ${texts.baseWidth} × ${texts.length} mm, ${texts.finCount} fins (estimate)`;

  const form = (
    <Card style={styles.card}>
      <Text variant="heading">Geometry</Text>
      <Text variant="caption" tone="muted">
        Vertical fins on a base; lengths in mm unless you type a unit (0.1 m, 35 µm).
      </Text>
      <View style={styles.row}>
        {KEYS.map((k) => (
          <GeometryField key={k} spec={PLATE_FIN_FIELDS[k]} value={texts[k]} onChange={(t) => setTexts((s) => ({ ...s, [k]: t }))} error={errors[k]} />
        ))}
      </View>
      <MaterialChips value={material} onChange={setMaterial} />
      <Text variant="heading">Conditions</Text>
      <NaturalConditionFields value={condition} onChange={setCondition} errors={errors} withSpeeds />
      {errors.form ? <InlineAlert message={errors.form} /> : null}
      {!wide && outcome.ok ? (
        <Text variant="bodyStrong" tone="accent">{`Rθsa in still air ${formatQuantity(outcome.estimate.natural.rsaKPerW, 'K/W')}: the estimate follows below.`}</Text>
      ) : null}
    </Card>
  );
  const result = (
    <Card style={styles.card}>
      <Text variant="heading">Estimate</Text>
      {outcome.ok ? <Estimate e={outcome.estimate} /> : <Text tone="muted">Fix the fields marked in red to see the estimate.</Text>}
      <SaveEstimate
        defaultName={defaultName}
        body={outcome.ok ? (name, rise, teamId) => plateFinCatalogueBody(name, outcome.estimate, rise, teamId) : null}
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
  block: { gap: spacing.xs },
});
