import type { StudyDocument } from './types';
import type { StudyResult } from './result-types';
import { createStudyModel } from './study-model';
import { ambientIntervals } from './ambient-intervals';
import { passDurationS } from './timeline';
import { createObserver } from './observer';
import { createEventLog } from './event-log';
import { bucketsForPoints } from './series-recorder';
import { makeRunner, runPasses } from './run-passes';
import { periodicStartState } from './periodic-start-state';
import { maxDifference } from './periodic';
import { assembleResult } from './assemble-result';
import { createRailSelectionCache, selectRailTaps, selectRailTapsCached, type RailSelection, type RailSelectionCache } from './rail-selection';
import { createSoaTracker } from './soa-tracker';
import type { EventLog } from './event-log';
import type { SegmentStart } from './run-passes';
import { CONVECTION_TOLERANCE, DEFAULT_SERIES_POINTS } from './constants';
import { siteAdjusted } from './site-adjust';
import { createJunctionHistory } from './junction-history';

export type EvaluateOptions = {
  /** Points per chart series (≥ 4); 0 leaves series out. Default DEFAULT_SERIES_POINTS (2,000). */
  seriesPoints?: number;
  /** Keep up to this many rows of node temperatures at solved boundaries (for CSV). Default 0. */
  boundaryRows?: number;
  /** Natural-convection re-linearisation tolerance on Rθsa (fraction). Default CONVECTION_TOLERANCE (1 %). */
  convectionTolerance?: number;
  /**
   * Most constant stretches the event-driven path may solve in this evaluation (all passes and
   * periodic iterations together) before it is refused with a RangeError; default
   * MAX_SOLVED_PIECES. Interactive callers set a lower budget.
   */
  maxStretches?: number;
  /** Use the event-driven path even for a linear study (cross-checks). */
  forceEventDriven?: boolean;
  /**
   * The case temperature an SOA operating point is checked at. 'stretch' (default): the highest
   * during its own stretch. 'peak': its device's highest of the whole run, which needs no search
   * per stretch; the allowed current only falls as the case warms (derating), so a point that
   * passes there passes at its stretch's temperature too. When every point passes so, the result
   * says so with those (conservative) case temperatures and margins; otherwise, or when points
   * had to be dropped to bound memory, the study is evaluated again with 'stretch' and that
   * result is returned. For a verdict: pass or fail is the same either way.
   */
  soaCaseTemperature?: 'stretch' | 'peak';
  /**
   * Work kept across evaluations by one caller (createEvaluationCache): the rail plan's tap
   * selection for a profile, plan and pass members met before. The result is the same with
   * or without it.
   */
  cache?: EvaluationCache;
};

export type EvaluationCache = { rail: RailSelectionCache };
export const createEvaluationCache = (): EvaluationCache => ({ rail: createRailSelectionCache() });

/** Logs a tap change where the selection moved at the start of a segment. */
function tapChangeLogger(rail: RailSelection, events: EventLog): SegmentStart {
  const name = (k: number) => rail.model.taps[k].name;
  return (timeS, s, pass) => {
    const c = rail.changeAt(pass, s);
    if (c) events.add({ kind: 'tap-change', timeS, from: c.from, to: c.to, fromName: name(c.from), toName: name(c.to), sensedV: c.sensedV });
  };
}

/**
 * Solves a study: selects the rail plan's taps over the profile (when it has one), builds
 * its network (Foster packages as Cauer ladders), turns the profile into constant-input
 * pieces and solves them exactly: the batch path when the study is linear, the event-driven
 * path when a device has thermal shutdown or a sink natural convection. Starts from every
 * node at the first ambient or, with `periodic`, from the periodic steady state. Devices
 * with an SOA model are checked at every operating point of the solution.
 */
export function evaluateStudy(written: StudyDocument, options: EvaluateOptions = {}): StudyResult {
  const tolerance = options.convectionTolerance ?? CONVECTION_TOLERANCE;
  if (!(tolerance > 0 && tolerance <= 0.5)) throw new RangeError(`convectionTolerance: must be above 0 and at most 0.5, got ${tolerance}`);
  const seriesPoints = options.seriesPoints ?? DEFAULT_SERIES_POINTS;
  if (seriesPoints !== 0 && !(Number.isInteger(seriesPoints) && seriesPoints >= 4)) {
    throw new RangeError(`seriesPoints: must be 0 or a whole number of at least 4, got ${seriesPoints}`);
  }
  const boundaryRows = options.boundaryRows ?? 0;
  if (!(Number.isInteger(boundaryRows) && boundaryRows >= 0)) throw new RangeError(`boundaryRows: must be a whole number ≥ 0, got ${boundaryRows}`);

  const sited = siteAdjusted(written);
  const atSite = sited ? sited.doc : written;
  const rail = atSite.railPlan ? (options.cache ? selectRailTapsCached(atSite, options.cache.rail) : selectRailTaps(atSite)) : null;
  const doc = rail ? rail.doc : atSite;
  const sm = createStudyModel(doc, tolerance);
  if (options.maxStretches !== undefined) {
    if (!(Number.isInteger(options.maxStretches) && options.maxStretches > 0)) throw new RangeError(`maxStretches: must be a positive whole number, got ${options.maxStretches}`);
    sm.work.limit = options.maxStretches;
  }
  const hasShutdown = doc.devices.some((d) => d.electrical?.thermalShutdown);
  const batch = !hasShutdown && sm.nonLinearSinks.length === 0 && !options.forceEventDriven;
  const ambient = ambientIntervals(doc.ambient);
  const total = passDurationS(doc) * doc.profile.repeat;
  const bucketCount = seriesPoints > 0 ? bucketsForPoints(seriesPoints) : 1;
  const bucketS = total / bucketCount;
  const warnings: string[] = [];

  let T0: Float64Array = new Float64Array(sm.reference.nodeCount).fill(ambient.valueC[0]);
  let on0 = doc.devices.map(() => true);
  let periodic: StudyResult['solver']['periodic'];
  if (doc.profile.periodic) {
    const start = periodicStartState(sm, batch, ambient, T0);
    T0 = start.T;
    on0 = start.on;
    periodic = { iterations: start.iterations, residualK: start.residualK, converged: start.converged };
    if (!start.converged) {
      warnings.push(`The profile did not settle to a periodic state within ${start.iterations} periods (last change ${start.residualK.toPrecision(3)} K); the results are for the period after that.`);
    }
  }

  // Lifetime counts one period of a periodic study (its steady state), else the whole run.
  const history = doc.lifetime ? createJunctionHistory(doc.devices.length, doc.profile.periodic ? passDurationS(doc) : total, doc.lifetime.arrhenius) : null;
  const observer = createObserver(sm, { bucketS, bucketCount, series: seriesPoints > 0, maxRows: boundaryRows, history });
  const events = createEventLog();
  const atPeak = options.soaCaseTemperature === 'peak';
  const soa = createSoaTracker(sm, !atPeak);
  const runner = makeRunner(sm, batch, observer, events, soa);
  runner.reset(T0, on0);
  const run = runPasses(doc, runner, ambient, doc.profile.repeat, bucketS, bucketCount, rail ? tapChangeLogger(rail, events) : undefined);
  soa?.finish(run.endS);
  if (periodic && batch) periodic.residualK = maxDifference(runner.T, T0, sm.dynamicNodes);
  // The case is the odd watch slot of its device (junction, case, …).
  if (soa && atPeak) soa.devices.forEach((d, k) => soa.accumulators[k].raiseCase(observer.peakC[2 * d + 1]));

  const result = assembleResult({
    sm,
    observer,
    events,
    run,
    method: batch ? 'batch' : 'event-driven',
    stretches: runner.stretches(),
    periodic,
    warnings,
    rsaRange: runner.rsaRange(),
    soa,
    rail,
    site: sited?.site,
    history,
  });
  if (soa && atPeak && (soa.accumulators.some((a) => a.droppedPoints > 0) || Object.values(result.soa).some((r) => !r.passed))) {
    return evaluateStudy(written, { ...options, soaCaseTemperature: 'stretch' });
  }
  return result;
}
