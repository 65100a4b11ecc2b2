import { siteAdjusted } from '../study/site-adjust';
import type { StudyDocument } from '../study/types';
import { checkArray, checkString } from './check';
import type { RankingOptions } from './rank-sinks';
import type { RankingEnclosure, RankingSegment, RankingSetup } from './ranking-setup';

/** Most segments a study profile may expand to for ranking (passes × segments). */
export const MAX_RANKING_SEGMENTS = 2_000_000;

export type StudyRanking = { setup: RankingSetup; options: RankingOptions; notes: string[] };

/** Where a sink's chain of `to` references ends: "ambient" or "enclosure" (the parser refuses loops). */
function chainEnd(doc: StudyDocument, sinkId: string): string {
  let to = doc.sinks.find((s) => s.id === sinkId)!.to;
  for (let hops = 0; to !== 'ambient' && to !== 'enclosure' && hops < doc.sinks.length; hops++) {
    const next = doc.sinks.find((s) => s.id === to);
    if (!next) break;
    to = next.to;
  }
  return to;
}

const fmt = (v: number) => Number(v.toPrecision(3)).toString();

/**
 * The ranking setup for one sink slot of a study: the devices mounted on it, the study's
 * margin, its profile (passes expanded, or periodic), its ambient. The slot must lead straight
 * to the ambient, or to the enclosure air as the only sink that does, with no other sink
 * mounted on it; the enclosure's Rθ is taken at the study's site, as its evaluation takes it.
 * Segments driven electrically need their dissipation: pass `powers` (per-part watts, e.g.
 * from the study's evaluation; devices on other sinks are left out) to supply it.
 */
export function rankingSetupFromStudy(doc: StudyDocument, sinkId: string, powers?: RankingSegment[]): StudyRanking {
  checkString(sinkId, 'sinkId');
  const sink = doc.sinks.find((s) => s.id === sinkId);
  if (!sink) throw new RangeError(`sinkId: the study has no sink "${sinkId}"`);
  if (sink.to !== 'ambient' && sink.to !== 'enclosure') {
    throw new RangeError(`sinks.${sinkId}.to: leads to sink "${sink.to}"; ranking models a sink that leads to the ambient or to the enclosure air`);
  }
  const mounted = doc.sinks.find((s) => s.to === sinkId);
  if (mounted) throw new RangeError(`sinks.${mounted.id}.to: is mounted on "${sinkId}"; ranking models one sink with devices only`);
  let enclosure: RankingEnclosure | undefined;
  if (sink.to === 'enclosure') {
    if (!doc.enclosure) throw new RangeError(`sinks.${sinkId}.to: leads to "enclosure" but the study has no enclosure`);
    // Another sink in the same enclosure would heat its air too, which the ranking does not model.
    const other = doc.sinks.find((s) => s.id !== sinkId && chainEnd(doc, s.id) === 'enclosure');
    if (other) {
      throw new RangeError(
        `sinks.${other.id}.to: ${other.to === 'enclosure' ? 'also leads' : `leads through sink "${other.to}"`} to the enclosure, whose air it would heat too; ` +
          `ranking models "${sinkId}" as the only sink in the enclosure`,
      );
    }
    // The enclosure's Rθ to the room as the study's evaluation uses it (derated at its site).
    const used = siteAdjusted(doc)?.doc.enclosure ?? doc.enclosure;
    enclosure = { rthKPerW: used.rthKPerW, capacityJPerK: used.capacityJPerK };
  }
  const devices = doc.devices.filter((d) => d.sink === sinkId);
  if (devices.length === 0) throw new RangeError(`sinkId: no device sits on sink "${sinkId}"`);
  const ids = new Set(devices.map((d) => d.id));
  const notes: string[] = [];

  let pass: RankingSegment[];
  if (powers !== undefined) {
    const elsewhere = new Set(doc.devices.filter((d) => d.sink !== sinkId).map((d) => d.id));
    const onSink = (power: Record<string, number>) => Object.fromEntries(Object.entries(power).filter(([id]) => !elsewhere.has(id)));
    // Anything else is left for prepareRanking to name.
    pass = (checkArray(powers, 'powers', 1) as RankingSegment[]).map((seg) =>
      elsewhere.size > 0 && typeof seg?.powerW === 'object' && seg.powerW !== null ? { ...seg, powerW: onSink(seg.powerW) } : seg,
    );
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
  if (enclosure) {
    const given = doc.enclosure!.rthKPerW;
    const atSite = enclosure.rthKPerW !== given ? ` (${fmt(given)} K/W as given, × ${fmt(enclosure.rthKPerW / given)} at the site's ${doc.site!.altitudeM} m)` : '';
    const capacity = enclosure.capacityJPerK ?? 0;
    notes.push(
      `The sink leads to the enclosure air, modelled as one node: Rθ ${fmt(enclosure.rthKPerW)} K/W to the room${atSite}, heat capacity ` +
        `${capacity > 0 ? `${fmt(capacity)} J/K` : '0 J/K (none given: the air follows the power at once)'}. ` +
        'In steady state all the power crosses the enclosure wall, so the steady answer counts the air’s rise.',
    );
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
      ...(enclosure ? { enclosure } : {}),
    },
    options,
    notes,
  };
}
