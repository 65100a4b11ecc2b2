import { StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { FactGrid } from '@/features/studies/components/fact-grid';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { formatPrefixed } from '../part-format';
import type { ElectricalJson } from '../types';
import { ValueTable } from './value-table';

export type ElectricalViewProps = { electrical: ElectricalJson };

/** Quiescent current, dropout and current-limit curves, thermal shutdown, as a study device uses them. */
export function ElectricalView({ electrical: e }: ElectricalViewProps) {
  const wide = useIsWide();
  const facts = [
    { label: 'Quiescent current Iq', value: formatPrefixed(e.iqA ?? 0, 'A') },
    {
      label: 'Thermal shutdown',
      value: e.thermalShutdown ? `at ${formatQuantity(e.thermalShutdown.tripC, '°C')}, back ${formatQuantity(e.thermalShutdown.hysteresisK, 'K')} lower` : '—',
    },
    ...(e.role ? [{ label: 'Role in a study', value: e.role === 'pass' ? 'pass element' : 'other' }] : []),
    ...(e.adjustable
      ? [{ label: 'Adjustable divider', value: `R1 ${formatQuantity(e.adjustable.r1Ohm, 'Ω')}, R2 ${formatQuantity(e.adjustable.r2Ohm, 'Ω')}, Vref ${formatQuantity(e.adjustable.vrefV ?? 1.25, 'V')}` }]
      : []),
  ];
  const dropout = e.dropout?.points ?? [];
  const limit = e.currentLimit?.points ?? [];
  return (
    <View style={styles.view}>
      <FactGrid facts={facts} />
      <View style={[styles.tables, wide && styles.tablesWide]}>
        <View style={styles.block}>
          <Text variant="label" tone="muted">
            Dropout against current
          </Text>
          {dropout.length ? (
            <ValueTable label="Dropout points" columns={['', 'Current', 'Dropout (V)']} rows={dropout.map((p, i) => [String(i + 1), formatPrefixed(p.currentA, 'A'), formatNumber(p.voltageV)])} />
          ) : (
            <Text tone="faint">None given: 0 V.</Text>
          )}
        </View>
        <View style={styles.block}>
          <Text variant="label" tone="muted">
            Current limit against Vin − Vout
          </Text>
          {limit.length ? (
            <ValueTable label="Current-limit points" columns={['', 'Vin − Vout (V)', 'Limit']} rows={limit.map((p, i) => [String(i + 1), formatNumber(p.differentialV), formatPrefixed(p.currentA, 'A')])} />
          ) : (
            <Text tone="faint">None given: no limit.</Text>
          )}
        </View>
      </View>
      <Text variant="caption" tone="faint">
        Curves are straight between points and flat beyond the first and last.
      </Text>
    </View>
  );
}

const styles = StyleSheet.create({
  view: { gap: spacing.md },
  tables: { gap: spacing.md },
  tablesWide: { flexDirection: 'row', alignItems: 'flex-start' },
  block: { flex: 1, gap: spacing.xs },
});
