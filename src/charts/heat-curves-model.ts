import type { Series, StudyResult } from '@/core/study';
import { chartColor } from '@/constants/theme';

export type NodeKind = 'junction' | 'case' | 'sink' | 'enclosure' | 'ambient';

/** How a series is drawn: colour plus a dash pattern, so no two kinds rely on colour alone. */
export type LineStyle = { stroke: string; width: number; dash?: string };

export type CurveSeries = {
  key: string;
  label: string;
  kind: NodeKind;
  style: LineStyle;
  series: Series;
  /** The exact peak from the solver (not the decimated chart points). */
  peak?: { timeS: number; valueC: number };
};

export type LimitLine = { key: string; label: string; kind: 'tjMax' | 'target'; valueC: number; style: LineStyle };

export type HeatCurvesModel = { curves: CurveSeries[]; limits: LimitLine[]; durationS: number };

const KIND_ORDER: Record<NodeKind, number> = { junction: 0, case: 1, sink: 2, enclosure: 3, ambient: 4 };

const KIND_LABEL: Record<NodeKind, string> = {
  junction: 'junction',
  case: 'case',
  sink: 'sink',
  enclosure: 'Enclosure air',
  ambient: 'Ambient',
};

function kindOf(key: string): { owner: string; kind: NodeKind } | null {
  if (key === 'ambient') return { owner: '', kind: 'ambient' };
  if (key === 'enclosure.air') return { owner: '', kind: 'enclosure' };
  const dot = key.lastIndexOf('.');
  const suffix = key.slice(dot + 1);
  if (suffix === 'junction' || suffix === 'case' || suffix === 'sink') return { owner: key.slice(0, dot), kind: suffix };
  return null;
}

function styleFor(kind: NodeKind, index: number): LineStyle {
  switch (kind) {
    case 'junction':
      return { stroke: chartColor.devices[index % chartColor.devices.length], width: 2 };
    case 'case':
      return { stroke: chartColor.devices[index % chartColor.devices.length], width: 1.5, dash: '6 3' };
    case 'sink':
      return { stroke: chartColor.sinks[index % chartColor.sinks.length], width: 2, dash: '1.5 3' };
    case 'enclosure':
      return { stroke: chartColor.enclosure, width: 1.5, dash: '8 3 2 3' };
    case 'ambient':
      return { stroke: chartColor.ambient, width: 1.25, dash: '10 4' };
  }
}

/** Groups equal limits of several devices into one line ("Tj,max 175 °C (Q1, Q2)"). */
function limitLines(result: StudyResult): LimitLine[] {
  const devices = Object.values(result.devices);
  const lines: LimitLine[] = [];
  for (const kind of ['tjMax', 'target'] as const) {
    const byValue = new Map<number, string[]>();
    for (const d of devices) {
      const v = kind === 'tjMax' ? d.tjMaxC : d.targetC;
      byValue.set(v, [...(byValue.get(v) ?? []), d.id]);
    }
    const name = kind === 'tjMax' ? 'Tj,max' : 'Target';
    for (const [valueC, ids] of byValue) {
      const who = byValue.size > 1 ? ` (${ids.join(', ')})` : '';
      lines.push({
        key: `${kind}:${valueC}`,
        label: `${name} ${Number(valueC.toFixed(1))}\u00a0°C${who}`,
        kind,
        valueC,
        style: kind === 'tjMax' ? { stroke: chartColor.tjMax, width: 1.25 } : { stroke: chartColor.target, width: 1.25, dash: '4 3' },
      });
    }
  }
  return lines;
}

/** What the heat-curves chart draws for a study result: its series in a stable order, limits and peaks. */
export function heatCurvesModel(result: StudyResult): HeatCurvesModel {
  const deviceIds = Object.keys(result.devices);
  const sinkIds = Object.keys(result.sinks);
  const curves: CurveSeries[] = [];
  for (const [key, series] of Object.entries(result.series ?? {})) {
    const parsed = kindOf(key);
    if (!parsed) continue;
    const { owner, kind } = parsed;
    const device = result.devices[owner];
    const sink = result.sinks[owner];
    const index = kind === 'sink' ? sinkIds.indexOf(owner) : deviceIds.indexOf(owner);
    let peak: CurveSeries['peak'];
    if (kind === 'junction' && device) peak = { timeS: device.peakTimeS, valueC: device.peakJunctionC };
    if (kind === 'case' && device) peak = { timeS: device.peakCaseTimeS, valueC: device.peakCaseC };
    if (kind === 'sink' && sink) peak = { timeS: sink.peakTimeS, valueC: sink.peakC };
    if (kind === 'enclosure' && result.enclosure) peak = { timeS: result.enclosure.peakTimeS, valueC: result.enclosure.peakC };
    curves.push({
      key,
      label: owner ? `${owner} ${KIND_LABEL[kind]}` : KIND_LABEL[kind],
      kind,
      style: styleFor(kind, Math.max(0, index)),
      series,
      peak,
    });
  }
  const rank = (c: CurveSeries) => {
    const owner = c.key.slice(0, c.key.lastIndexOf('.'));
    const index = c.kind === 'sink' ? sinkIds.indexOf(owner) : deviceIds.indexOf(owner);
    return KIND_ORDER[c.kind] >= 2 ? 1000 * KIND_ORDER[c.kind] + index : index * 10 + KIND_ORDER[c.kind];
  };
  curves.sort((a, b) => rank(a) - rank(b));
  return { curves, limits: limitLines(result), durationS: result.durationS };
}
