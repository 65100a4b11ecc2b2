import { checkOperatingPoints, needsLinearModeWarning, pulseFor, type SoaCheck, type SoaModel, type SoaOperatingPoint } from '../soa';
import { MAX_TRACKED_SOA_POINTS } from './constants';

/** One stretch of constant Vce and Ic of one part, with its highest case temperature. */
export type SoaStretch = SoaOperatingPoint;

/** Stretches alike in Vce, Ic and duration, merged: the hottest one (whose margin is the lowest) stands for all. */
export type MergedPoint = SoaStretch & { occurrences: number; firstTimeS: number };

export type SoaAccumulator = {
  add(stretch: SoaStretch): void;
  /** Merged points still held (at most MAX_TRACKED_SOA_POINTS). */
  points(): MergedPoint[];
  stretches: number;
  /** Merged points dropped to bound memory, and how many of them failed (margin < 1). */
  droppedPoints: number;
  droppedFailed: number;
  /** Stretches that need the MOSFET linear-mode warning, the first one's start and the core's message. */
  linearMode: { stretches: number; firstTimeS: number; message: string };
};

/**
 * The duration to 12 significant digits, so one summed over pieces cut at different chart
 * edges still matches (arithmetic, not toPrecision: this runs once per stretch).
 */
function durationKey(d: number): number {
  if (d === 0 || !Number.isFinite(d)) return d;
  const scale = 10 ** (11 - Math.floor(Math.log10(Math.abs(d))));
  return Math.round(d * scale) / scale;
}

/**
 * Collects the stretches of one device. The SOA shrinks as the case warms (derating) and
 * nothing else about a stretch depends on its time, so the hottest of identical stretches
 * carries their lowest margin. When the merged points outgrow MAX_TRACKED_SOA_POINTS they
 * are checked and only the lower-margin half is kept, so the worst point always survives.
 */
export function createSoaAccumulator(model: SoaModel, check: (points: SoaOperatingPoint[]) => SoaCheck = (p) => checkOperatingPoints(model, p)): SoaAccumulator {
  /** Merged points by Vce, then Ic, then duration (number keys: no string per stretch). */
  const index = new Map<number, Map<number, Map<number, MergedPoint>>>();
  /** The same points in the order they were first met. */
  const merged = new Set<MergedPoint>();
  const find = (s: SoaStretch): MergedPoint | undefined => index.get(s.vceV)?.get(s.icA)?.get(durationKey(s.durationS));
  function insert(p: MergedPoint): void {
    let byIc = index.get(p.vceV);
    if (!byIc) index.set(p.vceV, (byIc = new Map()));
    let byDuration = byIc.get(p.icA);
    if (!byDuration) byIc.set(p.icA, (byDuration = new Map()));
    byDuration.set(durationKey(p.durationS), p);
    merged.add(p);
  }
  function remove(p: MergedPoint): void {
    const byIc = index.get(p.vceV)!;
    const byDuration = byIc.get(p.icA)!;
    byDuration.delete(durationKey(p.durationS));
    if (byDuration.size === 0) byIc.delete(p.icA);
    if (byIc.size === 0) index.delete(p.vceV);
    merged.delete(p);
  }
  const pulse = new Map<number, boolean>();
  /** Whether a stretch this long needs the linear-mode warning (by duration: few distinct ones). */
  function linearModeFor(durationS: number): boolean {
    let v = pulse.get(durationS);
    if (v === undefined) {
      if (pulse.size > 4096) pulse.clear();
      pulse.set(durationS, (v = needsLinearModeWarning(model, pulseFor(model, durationS), durationS)));
    }
    return v;
  }
  const self: SoaAccumulator = {
    add,
    points: () => [...merged],
    stretches: 0,
    droppedPoints: 0,
    droppedFailed: 0,
    linearMode: { stretches: 0, firstTimeS: Infinity, message: '' },
  };

  function add(s: SoaStretch): void {
    self.stretches++;
    if (linearModeFor(s.durationS)) {
      if (self.linearMode.stretches === 0) self.linearMode.message = check([s]).warnings[0]?.message ?? '';
      self.linearMode.stretches++;
      self.linearMode.firstTimeS = Math.min(self.linearMode.firstTimeS, s.timeS);
    }
    const m = find(s);
    if (!m) {
      insert({ ...s, occurrences: 1, firstTimeS: s.timeS });
      if (merged.size > MAX_TRACKED_SOA_POINTS) compress();
      return;
    }
    m.occurrences++;
    m.firstTimeS = Math.min(m.firstTimeS, s.timeS);
    if (s.caseC > m.caseC) {
      m.caseC = s.caseC;
      m.timeS = s.timeS;
    }
  }

  function compress(): void {
    const entries = [...merged];
    const result = check(entries);
    const order = entries.map((_, i) => i).sort((a, b) => result.margin[a] - result.margin[b] || entries[a].timeS - entries[b].timeS);
    const keep = Math.floor(MAX_TRACKED_SOA_POINTS / 2);
    for (const i of order.slice(keep)) {
      remove(entries[i]);
      self.droppedPoints++;
      if (result.margin[i] < 1) self.droppedFailed++;
    }
  }

  return self;
}
