import { CELL_STATUS, railPlanReport, type DissipationMap, type MapLayer, type PassElement } from '../rails';
import type { Device, PackageModel, StudyDocument } from './types';
import type { RailSelection } from './rail-selection';
import type { RailMapLayer, RailMapResult, RailPlanResult, TapSegment } from './rail-result-types';
import { MAX_LISTED_TAP_SEGMENTS } from './constants';

/** Rθjc of a package model: the sum of its resistances, K/W. */
export function packageRthKPerW(model: PackageModel): number {
  if (model.kind === 'lumped') return model.rthKPerW;
  const terms = model.kind === 'foster' ? model.terms : model.stages;
  return terms.reduce((sum, t) => sum + t.rKPerW, 0);
}

/** The device entry as one pass element: n parts in parallel share the current, so curves scale by n. */
export function groupElement(device: Device): PassElement {
  const e = device.electrical;
  const n = device.count;
  const element: PassElement = {
    iqA: (e?.iqA ?? 0) * n,
    dropout: e?.dropout ? e.dropout.map((p) => ({ x: p.x * n, y: p.y })) : 0,
  };
  if (e?.currentLimit) element.currentLimit = e.currentLimit.map((p) => ({ x: p.x, y: p.y * n }));
  return element;
}

function layer(map: DissipationMap, l: MapLayer): RailMapLayer {
  const ni = map.ioutA.length;
  const rows = Array.from(map.voutV, (_, v) => v * ni);
  return {
    powerW: rows.map((c0) => Array.from({ length: ni }, (_, i) => (Number.isNaN(l.powerW[c0 + i]) ? null : l.powerW[c0 + i]))),
    status: rows.map((c0) => Array.from({ length: ni }, (_, i) => CELL_STATUS[l.status[c0 + i]])),
  };
}

function mapResult(map: DissipationMap): RailMapResult {
  const ni = map.ioutA.length;
  return {
    voutV: Array.from(map.voutV),
    ioutA: Array.from(map.ioutA),
    taps: map.taps.map((l) => layer(map, l)),
    overall: { ...layer(map, map.overall), tap: Array.from(map.voutV, (_, v) => Array.from(map.overall.tapIndex.subarray(v * ni, (v + 1) * ni))) },
  };
}

const finiteOrNull = (x: number) => (Number.isFinite(x) ? x : null);

type Listing = { segments: TapSegment[]; all: boolean; warnings: string[] };
/** Listings by selection (its taps array: a selection reused from a cache keeps it), made once each. */
const listings = new WeakMap<Int16Array, Listing>();

/** The first pass's rail segments with their taps, and a warning per tap asked for more than it can supply. */
function listSegments(sel: RailSelection): Listing {
  const known = listings.get(sel.taps);
  if (known) return known;
  const warnings: string[] = [];
  const segments: TapSegment[] = [];
  const warned = new Set<number>();
  let t = 0;
  let all = true;
  for (let s = 0; s < sel.firstPassLength; s++) {
    const segment = sel.written[s];
    const start = t;
    t += segment.durationS;
    if (!segment.railDrive || segment.durationS === 0) continue;
    const tap = sel.taps[s];
    const p = sel.pointOn(segment, tap);
    const compiled = sel.model.taps[tap];
    if (p.op.currentA > compiled.capabilityA && !warned.has(tap)) {
      warned.add(tap);
      warnings.push(
        `railPlan: at ${start} s the load draws ${p.op.currentA.toPrecision(3)} A from tap "${compiled.name}", which can supply ` +
          `${compiled.capabilityA.toPrecision(3)} A (${compiled.limitedBy} reaches its rating); its voltage there is extrapolated.`,
      );
    }
    if (segments.length >= MAX_LISTED_TAP_SEGMENTS) {
      all = false;
      continue;
    }
    segments.push({
      index: s,
      timeS: start,
      durationS: segment.durationS,
      ...(segment.label !== undefined ? { label: segment.label } : {}),
      tap,
      tapName: compiled.name,
      vinV: p.vinV,
      voutV: p.op.voutV,
      currentA: p.op.currentA,
      sensedV: p.sensedV,
    });
  }
  const listing = { segments, all, warnings };
  listings.set(sel.taps, listing);
  return listing;
}

/**
 * The rail plan's report for the study (map, worst cases, best thresholds, chatter) with the
 * required Rθsa for its device at the study's highest ambient, and the taps the profile used.
 */
export function railPlanResult(doc: StudyDocument, sel: RailSelection, changes: number): RailPlanResult {
  const plan = sel.plan;
  const device = doc.devices.find((d) => d.id === plan.device)!;
  const ambientC = doc.ambient.kind === 'constant' ? doc.ambient.temperatureC : Math.max(...doc.ambient.points.map((p) => p.temperatureC));
  const tjTargetC = device.tjMaxC - doc.marginK;
  // n parts share the total P: Tj − Ta = P·Rsa + (P/n)(Rjc + Rcs) (PHYSICS.md §5 for one device).
  const ownR = (packageRthKPerW(device.package) + device.interfaceRthKPerW) / device.count;
  const sink = (p: number) => (p > 0 ? (tjTargetC - ambientC) / p - ownR : Infinity);
  const range = { voutMinV: plan.map.voutMinV, voutMaxV: plan.map.voutMaxV, ioutMaxA: plan.map.ioutMaxA };
  const report = railPlanReport(sel.model, groupElement(device), range, {
    steps: { vout: plan.map.voutSteps, iout: plan.map.ioutSteps },
    sink,
    ...(plan.relay ? { relay: plan.relay } : {}),
  });
  const listing = listSegments(sel);
  const warnings = [...sel.warnings, ...report.warnings.map((w) => `railPlan: ${w}`), ...listing.warnings];
  const result: RailPlanResult = {
    device: device.id,
    sensed: plan.sensed,
    thresholdsV: [...plan.thresholdsV],
    hysteresisV: plan.hysteresisV,
    taps: report.taps,
    map: mapResult(report.map),
    worst: report.worst,
    thresholds: report.thresholds,
    worstWithBest: report.worstWithBest,
    selection: { segments: [...listing.segments], segmentsListedAll: listing.all, changes },
    warnings,
  };
  if (report.requiredRsa) {
    result.requiredRsa = { givenKPerW: finiteOrNull(report.requiredRsa.givenKPerW), bestKPerW: finiteOrNull(report.requiredRsa.bestKPerW), ambientC, tjTargetC };
  }
  if (report.chatter) result.chatter = { ...report.chatter, chatterAboveA: finiteOrNull(report.chatter.chatterAboveA) };
  return result;
}
