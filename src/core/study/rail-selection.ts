import { solveOperatingPoint, type OperatingPoint, type PassMember } from '../electrical';
import { compileRailPlan, nextTap, tapVoltage, tapWithoutHistory, type RailModel } from '../rails';
import type { Device, Profile, ProfileSegment, RailDrive, StudyDocument, StudyRailPlan } from './types';
import { MAX_EXPANDED_SEGMENTS } from './constants';

/** Vin = Vtap(I) and I (the current limit depends on Vin − Vout) are iterated to a fixed point. */
const VIN_ITERATIONS = 50;
const VIN_REL_TOL = 1e-12;

/** A rail segment on one tap: the tap's voltage at the current delivered, and what the comparator sees. */
export type TapPoint = { vinV: number; op: OperatingPoint; sensedV: number };
export type TapChangeAt = { from: number; to: number; sensedV: number };

type SelectionRun = { taps: Int16Array; changes: Map<number, TapChangeAt>; end: number | null };

export type RailSelection = {
  plan: StudyRailPlan;
  model: RailModel;
  /** The document with every railDrive segment turned into an electrical one with its tap's Vin. */
  doc: StudyDocument;
  /** Tap per segment of `doc` (−1 before the first rail segment). */
  taps: Int16Array;
  /** The tap change at the start of segment s of `doc` in pass p, if any. */
  changeAt(pass: number, s: number): TapChangeAt | undefined;
  pointOn(segment: ProfileSegment, tap: number): TapPoint;
  /** The segments of `doc` as written (railDrive), index by index. */
  written: readonly ProfileSegment[];
  /** Segments of `doc` in its first pass. */
  firstPassLength: number;
  warnings: string[];
};

/**
 * Selections kept across evaluations of one caller (an editor solving each edit again): by
 * parsed profile object, with the rail plan and pass members they were made for. The
 * selection depends on nothing else, so an edit of the ambient or the sink reuses it. For a
 * new profile (an edited step) under the same plan and members, the tap points by drive value
 * and the resolved segments by parsed segment are kept (`memo`), so only new steps are solved.
 */
export type RailSelectionCache = {
  byProfile: WeakMap<Profile, { key: string; selection: RailSelection }>;
  memo: { key: string; memo: SelectionMemo } | null;
};
export const createRailSelectionCache = (): RailSelectionCache => ({ byProfile: new WeakMap(), memo: null });

/** Work a selection can share with others under the same plan and pass members. */
export type SelectionMemo = {
  /** Points by what they depend on (fed devices, Vout, Iload; then tap by index). */
  byValue: Map<string, Map<number, Map<number, TapPoint[]>>>;
  /** Resolved segments (railDrive turned electrical) by parsed segment, per tap. */
  resolved: WeakMap<ProfileSegment, ProfileSegment[]>;
};
const createSelectionMemo = (): SelectionMemo => ({ byValue: new Map(), resolved: new WeakMap() });

/** What a selection depends on besides the profile: the plan and each device's count and electrical model (role, Iq, dropout, current limit). */
const selectionKey = (doc: StudyDocument): string => JSON.stringify([doc.railPlan, doc.devices.map((d) => [d.id, d.count, d.electrical ?? null])]);

/**
 * selectRailTaps through a cache: a selection made before for the same profile object, plan
 * and pass members is reused, with `doc` the given document's (its resolved profile kept).
 */
export function selectRailTapsCached(doc: StudyDocument, cache: RailSelectionCache): RailSelection {
  const key = selectionKey(doc);
  const known = cache.byProfile.get(doc.profile);
  if (known && known.key === key) return { ...known.selection, doc: { ...doc, profile: known.selection.doc.profile } };
  if (cache.memo?.key !== key) cache.memo = { key, memo: createSelectionMemo() };
  const selection = selectRailTaps(doc, cache.memo.memo);
  cache.byProfile.set(doc.profile, { key, selection });
  return selection;
}

const member = (d: Device): PassMember => ({
  count: d.count,
  iqA: d.electrical?.iqA ?? 0,
  dropout: d.electrical?.dropout,
  currentLimit: d.electrical?.currentLimit,
  on: true,
});

/**
 * Tap selection over the profile (PHYSICS.md §2). At the start of each rail segment the
 * comparator compares the sensed voltage (the output the current tap reaches, or the set
 * point) with θk ± h/2 and moves up or down until it rests; the state carries across
 * segments and passes. The selector starts without history (from the set point) at power-up
 * and, for a periodic study, where one period ends. Selection assumes every part conducts:
 * a thermal shutdown does not move the selector.
 */
export function selectRailTaps(doc: StudyDocument, memo: SelectionMemo = createSelectionMemo()): RailSelection {
  const plan = doc.railPlan!;
  const model = compileRailPlan(plan);
  const tapCount = model.taps.length;
  const passMembers = doc.devices.filter((d) => (d.electrical?.role ?? 'pass') === 'pass').map(member);
  const byId = new Map(doc.devices.map((d) => [d.id, d]));
  // Points by drive value (profiles repeat their steps; number keys, no key string per
  // segment) and resolved segments, shared with other selections under the same plan (memo).
  const { byValue, resolved: resolvedCache } = memo;
  const warnings: string[] = [];

  function pointOn(segment: ProfileSegment, tap: number): TapPoint {
    const drive = segment.railDrive!;
    const fedKey = drive.devices ? drive.devices.join(',') : '';
    let byVout = byValue.get(fedKey);
    if (!byVout) byValue.set(fedKey, (byVout = new Map()));
    let byIload = byVout.get(drive.voutV);
    if (!byIload) byVout.set(drive.voutV, (byIload = new Map()));
    let byTap = byIload.get(drive.iloadA);
    if (!byTap) byIload.set(drive.iloadA, (byTap = []));
    const known = byTap[tap];
    if (known) return known;
    const members = drive.devices ? drive.devices.map((id) => member(byId.get(id)!)) : passMembers;
    const solve = (vin: number) => solveOperatingPoint({ vinV: vin, voutV: drive.voutV, iloadA: drive.iloadA }, members);
    // The tap's load is the load current; Iq (milliamperes) is left out, as in the map.
    let vin = Math.max(0, tapVoltage(model, tap, drive.iloadA));
    let op = solve(vin);
    for (let k = 0; k < VIN_ITERATIONS; k++) {
      const next = Math.max(0, tapVoltage(model, tap, op.currentA));
      if (Math.abs(next - vin) <= VIN_REL_TOL * Math.max(1, vin)) break;
      vin = next;
      op = solve(vin);
    }
    const point = { vinV: vin, op, sensedV: plan.sensed === 'output' ? op.voutV : drive.voutV };
    byTap[tap] = point;
    return point;
  }

  function decide(segment: ProfileSegment, from: number | null): { tap: number; sensedV: number } {
    const drive = segment.railDrive as RailDrive;
    let tap = from ?? tapWithoutHistory(plan, drive.voutV);
    let sensedV = NaN;
    for (let k = 0; k <= 2 * tapCount; k++) {
      const seen = pointOn(segment, tap).sensedV;
      const next = nextTap(plan, tap, seen);
      if (next === tap) break;
      if (k === 0) sensedV = seen;
      tap = next;
    }
    return { tap, sensedV };
  }

  function run(segments: readonly ProfileSegment[], start: number | null): SelectionRun {
    const taps = new Int16Array(segments.length).fill(-1);
    const changes = new Map<number, TapChangeAt>();
    let tap = start;
    for (let s = 0; s < segments.length; s++) {
      const segment = segments[s];
      if (segment.railDrive && segment.durationS > 0) {
        const d = decide(segment, tap);
        if (tap !== null && d.tap !== tap) changes.set(s, { from: tap, to: d.tap, sensedV: d.sensedV });
        tap = d.tap;
      }
      if (tap !== null) taps[s] = tap;
    }
    return { taps, changes, end: tap };
  }

  let written = doc.profile.segments;
  let profile = doc.profile;
  let first: SelectionRun;
  let later: SelectionRun;
  if (profile.periodic) {
    // The period starts where it ends: look for a start tap the pass returns to.
    let start = run(written, null).end;
    let r = run(written, start);
    for (let k = 0; k <= tapCount && r.end !== start; k++) {
      start = r.end;
      r = run(written, start);
    }
    if (r.end !== start) warnings.push('railPlan: the tap selection does not return to the same tap after one period; the periodic state uses the last pattern tried.');
    first = later = r;
  } else {
    first = later = run(written, null);
    if (profile.repeat > 1) {
      later = run(written, first.end);
      if (!later.taps.every((t, i) => t === first.taps[i])) {
        // The first pass selects differently from the rest (history): lay the passes out one by one.
        const total = written.length * profile.repeat;
        if (total > MAX_EXPANDED_SEGMENTS) {
          throw new RangeError(`railPlan: the first pass selects other taps than the later ones, and laying out its ${profile.repeat} passes would take more than ${MAX_EXPANDED_SEGMENTS.toLocaleString('en')} segments; shorten the profile`);
        }
        const once = written;
        written = Array.from({ length: total }, (_, i) => once[i % once.length]);
        profile = { ...profile, segments: written, repeat: 1 };
        first = later = run(written, null);
      }
    }
  }

  const firstPassLength = doc.profile.segments.length;
  const resolved = written.map((segment, s) => {
    if (!segment.railDrive) return segment;
    const tap = first.taps[s] >= 0 ? first.taps[s] : tapWithoutHistory(plan, segment.railDrive.voutV);
    let list = resolvedCache.get(segment);
    if (!list) resolvedCache.set(segment, (list = []));
    if (!list[tap]) {
      // Rest and plain literals, no spreads: this runs once per segment of a long profile.
      const { railDrive, ...rest } = segment;
      const vinV = pointOn(segment, tap).vinV;
      const { voutV, iloadA, devices } = railDrive;
      const resolvedSegment: ProfileSegment = rest;
      resolvedSegment.electrical = devices ? { vinV, voutV, iloadA, devices } : { vinV, voutV, iloadA };
      list[tap] = resolvedSegment;
    }
    return list[tap];
  });
  const resolvedDoc: StudyDocument = { ...doc, profile: { ...profile, segments: resolved } };
  return {
    plan,
    model,
    doc: resolvedDoc,
    taps: first.taps,
    changeAt: (pass, s) => (pass === 0 ? first : later).changes.get(s),
    pointOn,
    written,
    firstPassLength,
    warnings,
  };
}
