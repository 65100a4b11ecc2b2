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
  /** Sets every merged point's case temperature to at least caseC. */
  raiseCase(caseC: number): void;
};

/**
 * The duration to 12 significant digits, so one summed over pieces cut at different chart
 * edges still matches (arithmetic, not toPrecision: this runs once per stretch).
 */
export function durationKey(d: number): number {
  if (d === 0 || !Number.isFinite(d)) return d;
  const scale = 10 ** (11 - Math.floor(Math.log10(Math.abs(d))));
  return Math.round(d * scale) / scale;
}

/** Bit patterns of doubles, for hashing the merge key. */
const hashBits = new Float64Array(1);
const hashWords = new Uint32Array(hashBits.buffer);

/** Map keys are equal under SameValueZero: 0 and −0 are one key, and so is every NaN. */
function wordsHash(h: number, x: number): number {
  hashBits[0] = x === 0 ? 0 : x !== x ? NaN : x;
  h = Math.imul(h ^ hashWords[0], 0x9e3779b1);
  h = Math.imul(h ^ hashWords[1], 0x85ebca77);
  return h ^ (h >>> 15);
}

const sameKey = (a: number, b: number) => a === b || (a !== a && b !== b);

/**
 * Collects the stretches of one device. The SOA shrinks as the case warms (derating) and
 * nothing else about a stretch depends on its time, so the hottest of identical stretches
 * carries their lowest margin. When the merged points outgrow MAX_TRACKED_SOA_POINTS they
 * are checked and only the lower-margin half is kept, so the worst point always survives.
 */
export function createSoaAccumulator(model: SoaModel, check: (points: SoaOperatingPoint[]) => SoaCheck = (p) => checkOperatingPoints(model, p)): SoaAccumulator {
  /** Merged points in the order they were first met, and each one's duration key. */
  let merged: MergedPoint[] = [];
  let keys = new Float64Array(64);
  /**
   * Open-addressing table over (Vce, Ic, duration key): slot value = 1 + index into merged,
   * 0 when empty (a stretch is a few numbers: no key string or nested map per stretch).
   */
  let table = new Int32Array(256);
  let mask = table.length - 1;
  const slotHash = (vceV: number, icA: number, key: number) => wordsHash(wordsHash(wordsHash(0x2545f491, vceV), icA), key);
  function find(vceV: number, icA: number, key: number): number {
    for (let i = slotHash(vceV, icA, key) & mask; ; i = (i + 1) & mask) {
      const e = table[i];
      if (e === 0) return ~i;
      const p = merged[e - 1];
      if (sameKey(p.vceV, vceV) && sameKey(p.icA, icA) && sameKey(keys[e - 1], key)) return e - 1;
    }
  }
  /** Lays the table out again for the points held (after growth or compression). */
  function rebuild(size: number): void {
    table = new Int32Array(size);
    mask = size - 1;
    for (let k = 0; k < merged.length; k++) {
      const p = merged[k];
      let i = slotHash(p.vceV, p.icA, keys[k]) & mask;
      while (table[i] !== 0) i = (i + 1) & mask;
      table[i] = k + 1;
    }
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
    points: () => merged.slice(),
    stretches: 0,
    droppedPoints: 0,
    droppedFailed: 0,
    linearMode: { stretches: 0, firstTimeS: Infinity, message: '' },
    raiseCase(caseC) {
      for (const p of merged) if (p.caseC < caseC) p.caseC = caseC;
    },
  };

  function add(s: SoaStretch): void {
    self.stretches++;
    if (linearModeFor(s.durationS)) {
      if (self.linearMode.stretches === 0) self.linearMode.message = check([s]).warnings[0]?.message ?? '';
      self.linearMode.stretches++;
      self.linearMode.firstTimeS = Math.min(self.linearMode.firstTimeS, s.timeS);
    }
    const key = durationKey(s.durationS);
    const found = find(s.vceV, s.icA, key);
    if (found < 0) {
      const k = merged.length;
      merged.push({ timeS: s.timeS, durationS: s.durationS, vceV: s.vceV, icA: s.icA, caseC: s.caseC, occurrences: 1, firstTimeS: s.timeS });
      if (k === keys.length) {
        const grown = new Float64Array(2 * k);
        grown.set(keys);
        keys = grown;
      }
      keys[k] = key;
      table[~found] = k + 1;
      if (2 * merged.length > table.length) rebuild(2 * table.length);
      if (merged.length > MAX_TRACKED_SOA_POINTS) compress();
      return;
    }
    const m = merged[found];
    m.occurrences++;
    m.firstTimeS = Math.min(m.firstTimeS, s.timeS);
    if (s.caseC > m.caseC) {
      m.caseC = s.caseC;
      m.timeS = s.timeS;
    }
  }

  function compress(): void {
    const entries = merged;
    const result = check(entries);
    const order = entries.map((_, i) => i).sort((a, b) => result.margin[a] - result.margin[b] || entries[a].timeS - entries[b].timeS);
    const keep = Math.floor(MAX_TRACKED_SOA_POINTS / 2);
    const dropped = new Uint8Array(entries.length);
    for (const i of order.slice(keep)) {
      dropped[i] = 1;
      self.droppedPoints++;
      if (result.margin[i] < 1) self.droppedFailed++;
    }
    merged = [];
    const kept = new Float64Array(keys.length);
    for (let i = 0; i < entries.length; i++) {
      if (dropped[i]) continue;
      kept[merged.length] = keys[i];
      merged.push(entries[i]);
    }
    keys = kept;
    rebuild(table.length);
  }

  return self;
}
