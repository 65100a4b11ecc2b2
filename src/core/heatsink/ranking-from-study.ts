import type { StudyDocument } from '../study/types';
import { checkArray, checkString } from './check';
import type { RankingOptions } from './rank-sinks';
import type { RankingSegment, RankingSetup } from './ranking-setup';

/** Most segments a study profile may expand to for ranking (passes × segments). */
export const MAX_RANKING_SEGMENTS = 2_000_000;

export type StudyRanking = { setup: RankingSetup; options: RankingOptions; notes: string[] };

/**
 * The ranking setup for one sink slot of a study: the devices mounted on it, the study's
 * margin, its profile (passes expanded, or periodic), its ambient. The slot must lead straight
 * to the ambient with no other sink mounted on it. Segments driven electrically need their
 * dissipation: pass `powers` (per-part watts, e.g. from the study's evaluation) to supply it.
 */
export function rankingSetupFromStudy(doc: StudyDocument, sinkId: string, powers?: RankingSegment[]): StudyRanking {
  checkString(sinkId, 'sinkId');
  const sink = doc.sinks.find((s) => s.id === sinkId);
  if (!sink) throw new RangeError(`sinkId: the study has no sink "${sinkId}"`);
  if (sink.to !== 'ambient') {
    throw new RangeError(`sinks.${sinkId}.to: leads to ${sink.to === 'enclosure' ? 'the enclosure' : `sink "${sink.to}"`}; ranking models a sink that leads straight to the ambient`);
  }
  const mounted = doc.sinks.find((s) => s.to === sinkId);
  if (mounted) throw new RangeError(`sinks.${mounted.id}.to: is mounted on "${sinkId}"; ranking models one sink with devices only`);
  const devices = doc.devices.filter((d) => d.sink === sinkId);
  if (devices.length === 0) throw new RangeError(`sinkId: no device sits on sink "${sinkId}"`);
  const ids = new Set(devices.map((d) => d.id));
  const notes: string[] = [];

  let pass: RankingSegment[];
  if (powers !== undefined) {
    pass = checkArray(powers, 'powers', 1) as RankingSegment[];
  } else {
    pass = doc.profile.segments.map((seg, i) => {
      if (seg.electrical || seg.railDrive) {
        throw new RangeError(`profile.segments[${i}]: its power comes from an electrical operating point; evaluate the study and pass the dissipated powers`);
      }
      return { durationS: seg.durationS, powerW: Object.fromEntries(Object.entries(seg.powerW).filter(([id]) => ids.has(id))) };
    });
  }
  let segments = pass;
  if (!doc.profile.periodic && doc.profile.repeat > 1) {
    if (pass.length * doc.profile.repeat > MAX_RANKING_SEGMENTS) {
      throw new RangeError(`profile.repeat: ${doc.profile.repeat} passes of ${pass.length} segments exceed ${MAX_RANKING_SEGMENTS} segments; rank on the periodic steady state instead`);
    }
    segments = Array.from({ length: doc.profile.repeat }, () => pass).flat();
  }

  let ambientC: number;
  if (doc.ambient.kind === 'constant') ambientC = doc.ambient.temperatureC;
  else {
    ambientC = Math.max(...doc.ambient.points.map((p) => p.temperatureC));
    notes.push(`The ambient profile is held at its highest value, ${ambientC} °C (conservative).`);
  }
  if (devices.some((d) => d.electrical?.thermalShutdown)) notes.push('Thermal shutdown is not simulated: a sink passes only if no junction comes near its trip point.');

  const options: RankingOptions = {};
  if (sink.forcedAir) options.airSpeedMPerS = sink.forcedAir.airSpeedMPerS;
  // The study's site derates every candidate as it derates the study's own sinks.
  if (doc.site) options.site = { altitudeM: doc.site.altitudeM, radiationShare: doc.site.radiationShare };
  return {
    setup: {
      devices: devices.map((d) => ({
        id: d.id,
        ...(d.name === undefined ? {} : { name: d.name }),
        tjMaxC: d.tjMaxC,
        package: d.package,
        interfaceRthKPerW: d.interfaceRthKPerW,
        count: d.count,
      })),
      segments,
      periodic: doc.profile.periodic,
      ambientC,
      marginK: doc.marginK,
    },
    options,
    notes,
  };
}
