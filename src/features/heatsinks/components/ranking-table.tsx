import { Link } from 'expo-router';
import { StyleSheet, View } from 'react-native';

import { Text, useIsWide } from '@/components/ui';
import { color, radius, spacing } from '@/constants/theme';
import { formatDuration, formatQuantity } from '@/features/studies/quantity-format';

import { formatMass, formatPrice } from '../heatsink-format';
import { formatVolume, hottest, rsaText } from '../ranking-text';
import type { RankedSink } from '../ranking-types';

type Cell = { text: string; note?: string; tone?: 'danger' | 'default' };

const COLUMNS: readonly { label: string; flex: number; cell: (s: RankedSink) => Cell }[] = [
  {
    label: 'Peak Tj',
    flex: 1.2,
    cell: (s) => {
      const h = hottest(s);
      return h ? { text: formatQuantity(h.peakC, '°C'), note: `${s.devices.length > 1 ? `${h.id} ` : ''}at ${formatDuration(h.peakTimeS)}` } : { text: '—' };
    },
  },
  {
    label: 'Margin',
    flex: 0.9,
    cell: (s) => (s.worstMarginK === null ? { text: '—' } : { text: formatQuantity(s.worstMarginK, 'K'), tone: s.worstMarginK < 0 ? 'danger' : 'default' }),
  },
  { label: 'Rθsa used', flex: 1.3, cell: (s) => rsaText(s) },
  { label: 'Mass', flex: 0.8, cell: (s) => ({ text: formatMass(s.massKg ?? null) }) },
  { label: 'Volume', flex: 0.9, cell: (s) => ({ text: formatVolume(s.volumeM3) }) },
  { label: 'Price', flex: 0.7, cell: (s) => ({ text: formatPrice(s.price ?? null) }) },
];

export type RankingTableProps = {
  label: string;
  sinks: readonly RankedSink[];
  /** The id of the row to highlight (the smallest passing sink). */
  highlight?: string | null;
};

function SinkName({ sink, highlighted }: { sink: RankedSink; highlighted: boolean }) {
  return (
    <View style={styles.nameCell}>
      <Link href={`/heatsinks/${sink.id}`}>
        <Text variant="bodyStrong" tone="accent">
          {sink.name ?? `Heatsink ${sink.id}`}
        </Text>
      </Link>
      {highlighted ? (
        <View style={styles.badge}>
          <Text variant="caption" style={styles.badgeText}>
            Smallest passing
          </Text>
        </View>
      ) : null}
    </View>
  );
}

/** Ranked sinks with their peak junction, margin, the Rθsa they ran with, mass, volume and price; each name opens its catalogue page. */
export function RankingTable({ label, sinks, highlight }: RankingTableProps) {
  const wide = useIsWide();
  if (!wide) {
    // A phone gets three short lines per sink instead of a table.
    return (
      <View role="list" aria-label={label} style={styles.cards}>
        {sinks.map((s) => {
          const on = s.id === highlight;
          const [peak, margin, rsa, mass, volume, price] = COLUMNS.map((c) => c.cell(s));
          return (
            <View key={s.id} role="listitem" testID={`ranked-${s.id}`} style={[styles.card, on && styles.highlight]}>
              <SinkName sink={s} highlighted={on} />
              <Text tone={margin.tone === 'danger' ? 'danger' : 'default'}>{`Peak Tj ${peak.text}${peak.note ? ` ${peak.note}` : ''} · margin ${margin.text}`}</Text>
              <Text variant="caption" tone="muted">{`Rθsa ${rsa.text}${rsa.note ? `, ${rsa.note}` : ''}`}</Text>
              <Text variant="caption" tone="muted">{`${mass.text} · ${volume.text} · price ${price.text}`}</Text>
            </View>
          );
        })}
      </View>
    );
  }
  return (
    <View role="table" aria-label={label} style={styles.table}>
      <View role="row" style={[styles.row, styles.header]}>
        <View role="columnheader" style={[styles.cell, { flex: 2.2 }]}>
          <Text variant="label" tone="muted">
            Heatsink
          </Text>
        </View>
        {COLUMNS.map((c) => (
          <View key={c.label} role="columnheader" style={[styles.cell, { flex: c.flex }]}>
            <Text variant="label" tone="muted">
              {c.label}
            </Text>
          </View>
        ))}
      </View>
      {sinks.map((s, i) => {
        const on = s.id === highlight;
        return (
          <View key={s.id} role="row" testID={`ranked-${s.id}`} style={[styles.row, i < sinks.length - 1 && styles.divider, on && styles.highlight]}>
            <View role="cell" style={[styles.cell, { flex: 2.2 }]}>
              <SinkName sink={s} highlighted={on} />
            </View>
            {COLUMNS.map((c) => {
              const cell = c.cell(s);
              return (
                <View key={c.label} role="cell" style={[styles.cell, { flex: c.flex }]}>
                  <Text tone={cell.tone === 'danger' ? 'danger' : cell.text === '—' ? 'faint' : 'default'}>{cell.text}</Text>
                  {cell.note ? (
                    <Text variant="caption" tone="faint">
                      {cell.note}
                    </Text>
                  ) : null}
                </View>
              );
            })}
          </View>
        );
      })}
    </View>
  );
}

const styles = StyleSheet.create({
  table: { borderWidth: 1, borderColor: color.border, borderRadius: radius.md, overflow: 'hidden' },
  row: { flexDirection: 'row', alignItems: 'flex-start' },
  header: { backgroundColor: color.surfaceMuted, borderBottomWidth: 1, borderBottomColor: color.border },
  divider: { borderBottomWidth: 1, borderBottomColor: color.border },
  cell: { paddingHorizontal: spacing.sm, paddingVertical: spacing.xs, gap: spacing.xxs },
  highlight: { backgroundColor: color.successSoft },
  nameCell: { gap: spacing.xxs, alignItems: 'flex-start' },
  badge: { borderRadius: radius.pill, backgroundColor: color.success, paddingHorizontal: spacing.sm, paddingVertical: 1 },
  badgeText: { color: color.onAccent },
  cards: { gap: spacing.sm },
  card: { gap: spacing.xxs, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.border },
});
