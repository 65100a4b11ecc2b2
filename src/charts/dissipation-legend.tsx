import { useState } from 'react';
import { StyleSheet, View, type LayoutChangeEvent } from 'react-native';
import Svg, { Defs, Line, Rect, Text as SvgText } from 'react-native-svg';

import { Text } from '@/components/ui';
import type { CellStatus } from '@/core/rails';
import { color, fontFamily, spacing } from '@/constants/theme';

import type { PowerScale } from './dissipation-colour';
import { cellMark } from './dissipation-map-model';
import { BLANK_FILL, MapPatterns, NEUTRAL_FILL } from './map-patterns';
import { LABEL_SIZE } from './plot-labels';

export type DissipationLegendProps = {
  scale: PowerScale;
  bins: number;
  /** Statuses the map holds; each one other than "ok" gets a swatch. */
  statuses: readonly CellStatus[];
  prefix: string;
  boundaries: boolean;
};

const BAR_HEIGHT = 12;
const fmt = (v: number) => String(Number(v.toPrecision(3)));

/** The colour bar in W (the same steps the cells use) and a swatch for every cell mark on the map. */
export function DissipationLegend({ scale, bins, statuses, prefix, boundaries }: DissipationLegendProps) {
  const [width, setWidth] = useState(0);
  const [lo, hi] = scale.domain;
  const barW = Math.max(0, width - 16);
  const xOf = (p: number) => 8 + ((p - lo) / (hi - lo)) * barW;
  const marks = statuses.filter((s) => s !== 'ok');
  return (
    <View style={styles.legend}>
      <View onLayout={(e: LayoutChangeEvent) => setWidth(Math.round(e.nativeEvent.layout.width))} style={styles.bar}>
        {width > 0 ? (
          <Svg width={width} height={BAR_HEIGHT + 20} role="img" aria-label={`Colour scale from ${fmt(lo)} to ${fmt(hi)} W`}>
            {Array.from({ length: bins }, (_, b) => (
              <Rect
                key={b}
                x={xOf(lo + ((hi - lo) * b) / bins)}
                y={0}
                width={barW / bins + 0.5}
                height={BAR_HEIGHT}
                fill={scale.colour(lo + ((hi - lo) * (b + 0.5)) / bins)}
              />
            ))}
            <Rect x={8} y={0} width={barW} height={BAR_HEIGHT} fill="none" stroke={color.borderStrong} strokeWidth={1} />
            {scale.ticks.map((t) => (
              <Line key={`l${t}`} x1={xOf(t)} x2={xOf(t)} y1={BAR_HEIGHT} y2={BAR_HEIGHT + 4} stroke={color.inkMuted} strokeWidth={1} />
            ))}
            {scale.ticks.map((t, k) => (
              <SvgText
                key={`t${t}`}
                x={xOf(t)}
                y={BAR_HEIGHT + 16}
                fontSize={LABEL_SIZE}
                fontFamily={fontFamily.regular}
                fill={color.inkMuted}
                textAnchor={k === 0 ? 'start' : 'middle'}
              >
                {k === scale.ticks.length - 1 ? `${fmt(t)} W` : fmt(t)}
              </SvgText>
            ))}
          </Svg>
        ) : null}
      </View>
      {marks.length > 0 || boundaries ? (
        <View role="list" aria-label="Map key" style={styles.key}>
          {marks.map((s) => {
            const mark = cellMark(s, s === 'dropout' ? 1 : null);
            return (
              <View key={s} role="listitem" style={styles.item}>
                <Svg width={18} height={14} aria-hidden>
                  <Defs>
                    <MapPatterns prefix={`${prefix}-${s}`} />
                  </Defs>
                  <Rect x={0.5} y={0.5} width={17} height={13} fill={mark.fill === 'power' ? scale.colour((lo + hi) / 2) : mark.fill === 'neutral' ? NEUTRAL_FILL : BLANK_FILL} stroke={color.borderStrong} />
                  <Rect x={0.5} y={0.5} width={17} height={13} fill={`url(#${prefix}-${s}-${mark.pattern})`} />
                </Svg>
                <Text variant="caption" tone="muted" style={styles.itemText}>
                  {mark.label}
                </Text>
              </View>
            );
          })}
          {boundaries ? (
            <View role="listitem" style={styles.item}>
              <Svg width={18} height={14} aria-hidden>
                <Line x1={9} x2={9} y1={0} y2={14} stroke={color.ink} strokeWidth={1.75} />
              </Svg>
              <Text variant="caption" tone="muted" style={styles.itemText}>
                boundary between taps
              </Text>
            </View>
          ) : null}
        </View>
      ) : null}
    </View>
  );
}

const styles = StyleSheet.create({
  legend: { gap: spacing.xs },
  bar: { width: '100%', maxWidth: 420 },
  key: { flexDirection: 'row', flexWrap: 'wrap', columnGap: spacing.md, rowGap: spacing.xs },
  item: { flexDirection: 'row', alignItems: 'center', gap: spacing.xs, maxWidth: '100%' },
  itemText: { flexShrink: 1 },
});
