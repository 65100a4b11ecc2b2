import { Link } from 'expo-router';
import { useState, type ReactNode } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Text } from '@/components/ui';
import { spacing } from '@/constants/theme';
import { formatQuantity } from '@/features/studies/quantity-format';

import { hottest } from '../ranking-text';
import type { RankedSink } from '../ranking-types';

export type RankingOthersProps = { failing: readonly RankedSink[]; excluded: readonly RankedSink[] };

const nameOf = (s: RankedSink) => s.name ?? `Heatsink ${s.id}`;

function failText(s: RankedSink): string {
  const h = hottest(s);
  const margin = s.worstMarginK === null ? '' : `${formatQuantity(s.worstMarginK, 'K')} margin`;
  return [margin, h ? `peak Tj ${formatQuantity(h.peakC, '°C')}${s.devices.length > 1 ? ` (${h.id})` : ''}` : ''].filter(Boolean).join(', ');
}

function Collapsed({ title, count, children }: { title: string; count: number; children: ReactNode }) {
  const [open, setOpen] = useState(false);
  if (count === 0) return null;
  return (
    <View style={styles.group}>
      <Button variant="ghost" label={`${open ? 'Hide' : 'Show'} ${count} ${title}`} onPress={() => setOpen((o) => !o)} style={styles.toggle} aria-expanded={open} />
      {open ? (
        <View role="list" aria-label={title} style={styles.list}>
          {children}
        </View>
      ) : null}
    </View>
  );
}

/** Sinks that fail (closest first, with their margins) and sinks left out (with why), folded away until asked for. */
export function RankingOthers({ failing, excluded }: RankingOthersProps) {
  return (
    <View style={styles.wrap}>
      <Collapsed title={failing.length === 1 ? 'failing sink' : 'failing sinks'} count={failing.length}>
        {failing.map((s) => (
          <View key={s.id} role="listitem" style={styles.item}>
            <Link href={`/heatsinks/${s.id}`}>
              <Text variant="bodyStrong" tone="accent">
                {nameOf(s)}
              </Text>
            </Link>
            <Text tone="danger">{failText(s)}</Text>
          </View>
        ))}
      </Collapsed>
      <Collapsed title={excluded.length === 1 ? 'sink left out' : 'sinks left out'} count={excluded.length}>
        {excluded.map((s) => (
          <View key={s.id} role="listitem" style={styles.item}>
            <Link href={`/heatsinks/${s.id}`}>
              <Text variant="bodyStrong" tone="accent">
                {nameOf(s)}
              </Text>
            </Link>
            <Text tone="muted">{s.reason ?? 'not simulated'}</Text>
          </View>
        ))}
      </Collapsed>
    </View>
  );
}

const styles = StyleSheet.create({
  wrap: { gap: spacing.xs },
  group: { gap: spacing.xs },
  toggle: { alignSelf: 'flex-start' },
  list: { gap: spacing.sm, paddingLeft: spacing.sm },
  item: { gap: spacing.xxs },
});
