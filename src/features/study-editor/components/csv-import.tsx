import { useMemo, useState } from 'react';
import { StyleSheet, View } from 'react-native';

import { Button, Chip, InlineAlert, Text, TextField } from '@/components/ui';
import type { UnitKind } from '@/core/units';
import { color, radius, spacing } from '@/constants/theme';

import { checkUnit, guessColumn, logSegments, readLog, unitFromHeader, type LogMapping, type LogSegment, type ValueSource } from '../csv-log';
import { readText } from '../quantity-text';
import { ColumnChoice, type ColumnPick } from './column-choice';
import { CsvFileButton } from './csv-file-button';

type Kind = 'electrical' | 'power';
type Picks = { time: ColumnPick; iload: ColumnPick; vin: ColumnPick; vout: ColumnPick; power: ColumnPick };

const PREVIEW_ROWS = 5;

function guessPicks(columns: string[]): Picks {
  const col = (role: Parameters<typeof guessColumn>[1], fallback: number) => {
    const i = guessColumn(columns, role);
    return i >= 0 ? i : fallback;
  };
  const voltage = guessColumn(columns, 'voltage');
  const pick = (column: number, kind: UnitKind, si: string): ColumnPick => ({ column, unit: column >= 0 ? unitFromHeader(columns[column], kind, si) : si, fixed: '' });
  const vin = guessColumn(columns, 'vin');
  return {
    time: pick(col('time', 0), 'time', 's'),
    iload: pick(col('current', Math.min(1, columns.length - 1)), 'current', 'A'),
    vin: pick(vin >= 0 ? vin : voltage >= 0 ? voltage : -1, 'voltage', 'V'),
    vout: pick(guessColumn(columns, 'vout'), 'voltage', 'V'),
    power: pick(col('power', Math.min(1, columns.length - 1)), 'power', 'W'),
  };
}

/** A value source from a pick; a fixed value that does not read gives the reason instead. */
function source(pick: ColumnPick, kind: UnitKind): ValueSource | string {
  if (pick.column >= 0) return checkUnit(pick.unit, kind) ?? { column: pick.column, unit: pick.unit.trim() };
  const read = readText(pick.fixed, kind);
  return read.ok ? { value: read.value } : read.reason;
}

export type CsvImportProps = { deviceIds: string[]; railPlan: boolean; onApply: (segments: LogSegment[], mode: 'append' | 'replace') => void; onClose: () => void };

/**
 * Logged time with voltage and current (or power) pasted or picked as CSV, previewed, its
 * columns chosen, and turned into segments: each row lasts until the next row's time.
 */
export function CsvImport({ deviceIds, railPlan, onApply, onClose }: CsvImportProps) {
  const [text, setText] = useState('');
  const [fileError, setFileError] = useState<string | null>(null);
  const [kind, setKind] = useState<Kind>('electrical');
  const [picks, setPicks] = useState<Picks | null>(null);
  const [device, setDevice] = useState(deviceIds[0] ?? '');
  const [merge, setMerge] = useState(true);

  const read = useMemo(() => readLog(text), [text]);
  const table = read.ok ? read.table : null;
  const columns = useMemo(() => table?.columns ?? [], [table]);
  // A new set of columns gets fresh guesses; the user's choices hold while the text is edited.
  const current = picks && table && picks.time.column < columns.length ? picks : table ? guessPicks(columns) : null;

  const sources = current
    ? {
        time: checkUnit(current.time.unit, 'time') ?? { column: current.time.column, unit: current.time.unit.trim() },
        iload: source(current.iload, 'current'),
        vin: source(current.vin, 'voltage'),
        vout: source(current.vout, 'voltage'),
        power: source(current.power, 'power'),
      }
    : null;
  const setPick = (key: keyof Picks) => (pick: ColumnPick) => current && setPicks({ ...current, [key]: pick });
  const problem = (s: ValueSource | string | undefined) => (typeof s === 'string' ? s : null);

  let mapping: LogMapping | null = null;
  if (sources && typeof sources.time !== 'string') {
    if (kind === 'power' && typeof sources.power !== 'string' && device) mapping = { kind, time: sources.time, power: sources.power, device };
    if (kind === 'electrical' && typeof sources.iload !== 'string' && typeof sources.vout !== 'string' && (railPlan || typeof sources.vin !== 'string')) {
      mapping = { kind, time: sources.time, iload: sources.iload, vout: sources.vout, vin: railPlan ? null : (sources.vin as ValueSource) };
    }
  }
  const result = table && mapping ? logSegments(table, mapping, merge) : null;
  const totalS = result?.ok ? result.segments.reduce((s, x) => s + x.durationS, 0) : 0;

  return (
    <View style={styles.box} role="region" aria-label="Import a log" testID="csv-import">
      <Text variant="bodyStrong">Import logged data (CSV)</Text>
      <Text variant="caption" tone="muted">
        Columns of time and voltage and current, or time and power; a first row of names is optional. Each row holds until the next row’s time, so the last row only marks the end.
      </Text>
      <View style={styles.actions}>
        <CsvFileButton
          onText={(t) => {
            setFileError(null);
            setPicks(null);
            setText(t);
          }}
          onError={setFileError}
        />
      </View>
      {fileError ? <InlineAlert message={fileError} /> : null}
      <TextField
        label="CSV text"
        value={text}
        onChangeText={(t) => {
          setText(t);
          setPicks(null);
        }}
        multiline
        autoCapitalize="none"
        autoCorrect={false}
        placeholder={'time_s,current_a\n0,0.5\n2,3'}
      />
      {text.trim() !== '' && !read.ok ? <InlineAlert message={read.reason} /> : null}

      {table && current && sources ? (
        <>
          <View style={styles.preview} role="table" aria-label="First rows" testID="csv-preview">
            <View style={[styles.previewRow, styles.previewHead]}>
              {columns.map((c, i) => (
                <Text key={`${i}-${c}`} variant="label" style={styles.cell} numberOfLines={1}>
                  {c}
                </Text>
              ))}
            </View>
            {table.rows.slice(0, PREVIEW_ROWS).map((row) => (
              <View key={row.line} style={styles.previewRow}>
                {row.cells.map((cell, i) => (
                  <Text key={i} variant="mono" style={styles.cell} numberOfLines={1}>
                    {cell}
                  </Text>
                ))}
              </View>
            ))}
            <Text variant="caption" tone="faint">
              {table.rows.length} data rows{table.rows.length > PREVIEW_ROWS ? `, first ${PREVIEW_ROWS} shown` : ''}.
            </Text>
          </View>

          <View role="radiogroup" aria-label="The log holds" style={styles.chips}>
            <Chip label="Voltage and current" selected={kind === 'electrical'} onPress={() => setKind('electrical')} />
            <Chip label="Power" selected={kind === 'power'} onPress={() => setKind('power')} />
          </View>
          <ColumnChoice label="Time" columns={columns} pick={current.time} unitLabel="s" onChange={setPick('time')} error={problem(sources.time)} />
          {kind === 'electrical' ? (
            <>
              <ColumnChoice label="Load current" columns={columns} pick={current.iload} allowFixed unitLabel="A" onChange={setPick('iload')} error={problem(sources.iload)} />
              {railPlan ? null : <ColumnChoice label="Vin" columns={columns} pick={current.vin} allowFixed unitLabel="V" onChange={setPick('vin')} error={problem(sources.vin)} />}
              <ColumnChoice label="Vout" columns={columns} pick={current.vout} allowFixed unitLabel="V" onChange={setPick('vout')} error={problem(sources.vout)} />
            </>
          ) : (
            <>
              <ColumnChoice label="Power per part" columns={columns} pick={current.power} allowFixed unitLabel="W" onChange={setPick('power')} error={problem(sources.power)} />
              <View role="radiogroup" aria-label="Of device" style={styles.chips}>
                {deviceIds.map((id) => (
                  <Chip key={id} label={`Device ${id}`} selected={device === id} onPress={() => setDevice(id)} />
                ))}
              </View>
            </>
          )}
          <View role="radiogroup" aria-label="Equal rows" style={styles.chips}>
            <Chip label="Join equal neighbouring rows" selected={merge} onPress={() => setMerge(true)} />
            <Chip label="One segment per row" selected={!merge} onPress={() => setMerge(false)} />
          </View>

          {result && !result.ok ? (
            <View role="alert" style={styles.errors}>
              {result.errors.map((e) => (
                <Text key={`${e.line}-${e.column}`} tone="danger">
                  Line {e.line}, {e.column}: {e.reason}
                </Text>
              ))}
            </View>
          ) : null}
          {result?.ok ? (
            <>
              <Text testID="csv-result">
                {table.rows.length} rows give {result.segments.length} {result.segments.length === 1 ? 'segment' : 'segments'} over {Number(totalS.toPrecision(6))} s.
              </Text>
              <View style={styles.actions}>
                <Button label={`Append ${result.segments.length} segments`} onPress={() => onApply(result.segments, 'append')} />
                <Button label="Replace all segments" variant="secondary" onPress={() => onApply(result.segments, 'replace')} />
                <Button label="Cancel" variant="ghost" onPress={onClose} />
              </View>
            </>
          ) : (
            <Button label="Cancel" variant="ghost" onPress={onClose} style={styles.cancel} />
          )}
        </>
      ) : (
        <Button label="Cancel" variant="ghost" onPress={onClose} style={styles.cancel} />
      )}
    </View>
  );
}

const styles = StyleSheet.create({
  box: { gap: spacing.md, padding: spacing.md, borderRadius: radius.md, borderWidth: 1, borderColor: color.accent, backgroundColor: color.accentSoft },
  actions: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  chips: { flexDirection: 'row', flexWrap: 'wrap', gap: spacing.sm },
  preview: { gap: spacing.xxs, padding: spacing.sm, borderRadius: radius.md, backgroundColor: color.surface },
  previewRow: { flexDirection: 'row', gap: spacing.sm },
  previewHead: { borderBottomWidth: 1, borderBottomColor: color.border, paddingBottom: spacing.xxs },
  cell: { flex: 1, minWidth: 60 },
  errors: { gap: spacing.xxs },
  cancel: { alignSelf: 'flex-start' },
});
