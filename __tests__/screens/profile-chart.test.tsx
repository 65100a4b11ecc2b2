import { fireEvent, render } from '@testing-library/react-native';
import { scaleLinear } from 'd3-scale';
import { Path } from 'react-native-svg';

import { liveEditDocument } from '@/cli/bench-live';
import { ProfileChart, type ProfileChartSeries } from '@/charts/profile-chart';
import { PLOT_MARGIN } from '@/charts/plot-frame';

const WIDTH = 640;
const HEIGHT = 180;

/** The load current of the 10,000-segment live-edit profile (demo data), one step after the other. */
function loadCurrent(): ProfileChartSeries {
  const segments = (liveEditDocument() as { profile: { segments: { durationS: number; iloadA: number }[] } }).profile.segments;
  let t = 0;
  const steps = segments.map((s) => {
    const step = { startS: t, endS: t + s.durationS, value: s.iloadA };
    t += s.durationS;
    return step;
  });
  return { key: 'iload', label: 'Load current', steps };
}

/** The vertices of an SVG path of straight lines ("M x,y L x,y …"). */
const vertices = (d: string) => [...d.matchAll(/(-?[\d.]+(?:e-?\d+)?),(-?[\d.]+(?:e-?\d+)?)/g)].map((m) => [Number(m[1]), Number(m[2])]);

// Min/max decimation ("peak detect") keeps every interval's extremes: common practice. The
// reference is the raw segments themselves, placed with the chart's own scales.
describe('profile preview chart of a long profile', () => {
  it('draws 10,000 segments as a per-pixel band whose top line reaches every segment’s value', () => {
    const series = loadCurrent();
    const durationS = series.steps[series.steps.length - 1].endS;
    const view = render(<ProfileChart series={[series]} unit="A" durationS={durationS} label="Load profile" height={HEIGHT} />);
    const box = view.UNSAFE_root.findAll((n) => typeof n.props.onLayout === 'function')[0];
    fireEvent(box, 'layout', { nativeEvent: { layout: { x: 0, y: 0, width: WIDTH, height: HEIGHT } } });

    const paths = view.UNSAFE_getAllByType(Path).map((p) => String(p.props.d));
    // One band and one line: far fewer vertices than segments, at most two per pixel column.
    expect(paths).toHaveLength(2);
    const [band, top] = paths.map(vertices);
    const plotWidth = WIDTH - PLOT_MARGIN.right - PLOT_MARGIN.left;
    expect(top.length).toBeLessThanOrEqual(2 * plotWidth);
    expect(band.length).toBeLessThanOrEqual(4 * plotWidth);

    // The chart's scales, as the component builds them.
    const max = Math.max(...series.steps.map((s) => s.value));
    const x = scaleLinear().domain([0, durationS]).range([PLOT_MARGIN.left, WIDTH - PLOT_MARGIN.right]);
    const y = scaleLinear().domain([0, max * 1.08]).range([HEIGHT - PLOT_MARGIN.bottom, PLOT_MARGIN.top]).nice();
    // The top line's height at a time: the highest vertex drawn over that pixel column.
    const column = new Map<number, number>();
    for (const [vx, vy] of top) column.set(Math.round(vx), Math.min(vy, column.get(Math.round(vx)) ?? Infinity));
    const topAt = (px: number) => Math.min(...[-1, 0, 1].map((k) => column.get(Math.round(px) + k) ?? Infinity));
    // Up is smaller y: the line is at or above each segment's value (to a hundredth of a pixel).
    const below = series.steps.filter((s) => topAt(x((s.startS + s.endS) / 2)) > y(s.value) + 0.01);
    expect(below).toEqual([]);
    // And the highest segment sets the highest point drawn (the path keeps three decimals).
    expect(Math.min(...top.map(([, vy]) => vy))).toBeCloseTo(y(max), 2);
  });
});
