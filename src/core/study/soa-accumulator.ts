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

// 12 digits: a duration summed over pieces cut at different chart edges still matches.
const keyOf = (s: SoaStretch) => `${s.vceV}|${s.icA}|${s.durationS.toPrecision(12)}`;

/**
 * Collects the stretches of one device. The SOA shrinks as the case warms (derating) and
 * nothing else about a stretch depends on its time, so the hottest of identical stretches
 * carries their lowest margin. When the merged points outgrow MAX_TRACKED_SOA_POINTS they
 * are checked and only the lower-margin half is kept, so the worst point always survives.
 */
export function createSoaAccumulator(model: SoaModel, check: (points: SoaOperatingPoint[]) => SoaCheck = (p) => checkOperatingPoints(model, p)): SoaAccumulator {
  const merged = new Map<string, MergedPoint>();
  const self: SoaAccumulator = {
    add,
    points: () => [...merged.values()],
    stretches: 0,
    droppedPoints: 0,
    droppedFailed: 0,
    linearMode: { stretches: 0, firstTimeS: Infinity, message: '' },
  };

  function add(s: SoaStretch): void {
    self.stretches++;
    if (needsLinearModeWarning(model, pulseFor(model, s.durationS), s.durationS)) {
      if (self.linearMode.stretches === 0) self.linearMode.message = check([s]).warnings[0]?.message ?? '';
      self.linearMode.stretches++;
      self.linearMode.firstTimeS = Math.min(self.linearMode.firstTimeS, s.timeS);
    }
    const key = keyOf(s);
    const m = merged.get(key);
    if (!m) {
      merged.set(key, { ...s, occurrences: 1, firstTimeS: s.timeS });
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
    const entries = [...merged.entries()];
    const result = check(entries.map(([, p]) => p));
    const order = entries.map((_, i) => i).sort((a, b) => result.margin[a] - result.margin[b] || entries[a][1].timeS - entries[b][1].timeS);
    const keep = Math.floor(MAX_TRACKED_SOA_POINTS / 2);
    for (const i of order.slice(keep)) {
      merged.delete(entries[i][0]);
      self.droppedPoints++;
      if (result.margin[i] < 1) self.droppedFailed++;
    }
  }

  return self;
}
