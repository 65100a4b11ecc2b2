import { rankSinks, rankingSetupFromStudy, SORT_KEYS, type RankingOptions, type SinkCandidate, type SortKey } from '../../src/core/heatsink';
import { evaluateStudy, type StudyDocument } from '../../src/core/study';
import { fedDevices, segmentPower } from '../../src/core/study/segment-power';
import type { Db } from '../db';
import { AppError } from '../errors';
import type { Heatsink, Study } from '../models';
import { checkDocument } from './study-document';

export type RankingQuery = { sinkId?: string; sortBy?: string; airSpeedMPerS?: number; ambientC?: number; marginK?: number };

/** A catalogue row as the ranking core's candidate: still-air rating (with its convection exponent when set), forced-air points, mass, size, price. */
export function candidateOf(h: Heatsink): SinkCandidate {
  const volumeM3 = h.widthMm && h.lengthMm && h.heightMm ? (h.widthMm * h.lengthMm * h.heightMm) / 1e9 : undefined;
  return {
    id: String(h.id),
    name: h.name,
    natural: { rthKPerW: h.rthKPerW, referenceRiseK: h.referenceRiseK, ...(h.convectionExponent == null ? {} : { exponent: h.convectionExponent }) },
    forcedAir: h.forcedAir.length ? h.forcedAir : undefined,
    capacityJPerK: h.capacityJPerK ?? undefined,
    massKg: h.massKg ?? undefined,
    material: h.material ?? undefined,
    volumeM3,
    price: h.price ?? undefined,
    devicesPerSink: h.devicesPerSink,
  };
}

/**
 * Per-part watts of every segment, with every device on (ranking does not model shutdown).
 * Segments fed by a rail plan take the input voltage of the tap the study's own evaluation
 * selected for them in its first pass.
 */
function segmentPowers(doc: StudyDocument) {
  const on = doc.devices.map(() => true);
  const selection = doc.railPlan ? evaluateStudy(doc, { seriesPoints: 0 }).railPlan?.selection : undefined;
  return doc.profile.segments.map((segment, i) => {
    let drive = segment;
    if (segment.railDrive) {
      const chosen = selection?.segments.find((s) => s.index === i);
      if (!chosen) throw new AppError(409, 'not_rankable', `profile.segments[${i}]: the rail plan's tap for this segment is not known (the profile is too long to list); rank with a shorter profile`);
      drive = { ...segment, electrical: { vinV: chosen.vinV, voutV: segment.railDrive.voutV, iloadA: segment.railDrive.iloadA, devices: segment.railDrive.devices } };
    }
    const { partPowerW } = segmentPower(doc, drive, fedDevices(doc, drive), on);
    return { durationS: segment.durationS, powerW: Object.fromEntries(doc.devices.map((d, k) => [d.id, partPowerW[k]])) };
  });
}

/**
 * Every heatsink of the study's team catalogue simulated on the study's real profile in the
 * slot of one of its sinks, with what-ifs for air speed, ambient and margin.
 */
export async function rankStudy(db: Db, study: Study, query: RankingQuery) {
  if (!study.document) throw new AppError(409, 'no_document', 'This study has no study document to rank sinks for yet');
  const doc = checkDocument(study.document);
  const sinkId = query.sinkId ?? doc.sinks[0]?.id;
  if (!sinkId) throw AppError.badRequest('sink: the study has no sink', [{ path: 'sink', message: 'the study has no sink' }]);
  if (query.sortBy !== undefined && !(SORT_KEYS as readonly string[]).includes(query.sortBy)) {
    throw AppError.badRequest(`sort: must be one of ${SORT_KEYS.join(', ')}`, [{ path: 'sort', message: `must be one of ${SORT_KEYS.join(', ')}` }]);
  }
  // Ordered, so sinks that tie rank the same way on every database (PostgreSQL has no implicit row order).
  const rows = await db.models.Heatsink.findAll({ where: { teamId: study.teamId }, order: [['id', 'ASC']] });
  try {
    const { setup, options, notes } = rankingSetupFromStudy(doc, sinkId, segmentPowers(doc));
    const merged: RankingOptions = {
      ...options,
      ...(query.sortBy ? { sortBy: query.sortBy as SortKey } : {}),
      ...(query.airSpeedMPerS !== undefined ? { airSpeedMPerS: query.airSpeedMPerS } : {}),
      ...(query.ambientC !== undefined ? { ambientC: query.ambientC } : {}),
      ...(query.marginK !== undefined ? { marginK: query.marginK } : {}),
    };
    const result = rankSinks(setup, rows.map(candidateOf), merged);
    return { sinkId, candidates: rows.length, options: merged, notes, result };
  } catch (err) {
    if (err instanceof RangeError || err instanceof TypeError) {
      const cut = err.message.indexOf(': ');
      throw AppError.badRequest(err.message, [{ path: cut > 0 ? err.message.slice(0, cut) : 'study', message: cut > 0 ? err.message.slice(cut + 2) : err.message }]);
    }
    throw err;
  }
}
