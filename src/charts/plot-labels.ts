import type { CurveSeries, LimitLine } from './heat-curves-model';
import { labelWidth, placeLabels, type Box } from './label-layout';
import type { PlotFrame } from './plot-frame';
import { formatTemperature } from './temperature-axis';

export const LABEL_SIZE = 11;

export type PlacedLabel = { key: string; text: string; color: string; box: Box };

const box = (x: number, baseline: number, text: string): Box => ({
  x,
  y: baseline - LABEL_SIZE + 2,
  width: labelWidth(text, LABEL_SIZE),
  height: LABEL_SIZE + 1,
});

/**
 * Where the limit labels (right end, above Tj,max and below the target) and the junction-peak
 * values go, so that none covers another; a peak value with no free place is left to the
 * crosshair read-out.
 */
export function plotLabels(frame: PlotFrame, limits: readonly LimitLine[], curves: readonly CurveSeries[]): PlacedLabel[] {
  const { x, y, left, right, top, bottom } = frame;
  const [t0, t1] = x.domain();
  const labels: PlacedLabel[] = [];
  for (const limit of limits) {
    const ly = y(limit.valueC);
    if (ly < top - 1 || ly > bottom + 1) continue;
    const width = labelWidth(limit.label, LABEL_SIZE);
    labels.push({ key: limit.key, text: limit.label, color: limit.style.stroke, box: box(right - 4 - width, limit.kind === 'tjMax' ? ly - 4 : ly + 12, limit.label) });
  }
  const peaks = curves
    .filter((c) => c.kind === 'junction' && c.peak && c.peak.timeS >= t0 && c.peak.timeS <= t1)
    .sort((a, b) => b.peak!.valueC - a.peak!.valueC);
  const bounds: Box = { x: left, y: top - LABEL_SIZE, width: right - left, height: bottom - top + LABEL_SIZE };
  const options = peaks.map((c) => {
    const text = formatTemperature(c.peak!.valueC);
    const width = labelWidth(text, LABEL_SIZE);
    const px = x(c.peak!.timeS);
    const py = y(c.peak!.valueC);
    const centred = Math.min(right - width, Math.max(left, px - width / 2));
    // Beside the marker first: a peak usually ends a rise, so the curve has left that height.
    return [box(px + 8, py + 4, text), box(centred, py - 9, text), box(px - width - 8, py + 4, text), box(centred, py + 18, text)];
  });
  const markers = curves
    .filter((c) => c.peak && c.peak.timeS >= t0 && c.peak.timeS <= t1)
    .map((c): Box => ({ x: x(c.peak!.timeS) - 5, y: y(c.peak!.valueC) - 5, width: 10, height: 10 }));
  const placed = placeLabels(options, [...labels.map((l) => l.box), ...markers], bounds);
  peaks.forEach((c, i) => {
    const b = placed[i];
    if (b) labels.push({ key: `peak-${c.key}`, text: formatTemperature(c.peak!.valueC), color: c.style.stroke, box: b });
  });
  return labels;
}
