import type { Device, PackageModel, ProfileSegment, Sink, StudyDocument } from '../study';
import type { ActiveInput, InputKey } from './types';

/** Deviations of one run, by input: fractions (0.1 = +10 %) or, for the ambient, K. */
export type Deviations = Partial<Record<InputKey, number>>;

export function deviationsOf(inputs: readonly ActiveInput[], values: ArrayLike<number>): Deviations {
  const out: Deviations = {};
  inputs.forEach((input, j) => {
    out[input.key] = values[j];
  });
  return out;
}

function scalePackage(p: PackageModel, f: number): PackageModel {
  switch (p.kind) {
    case 'lumped':
      return { ...p, rthKPerW: p.rthKPerW * f };
    case 'foster':
      return { kind: 'foster', terms: p.terms.map((t) => ({ ...t, rKPerW: t.rKPerW * f })) };
    case 'cauer':
      return { kind: 'cauer', stages: p.stages.map((s) => ({ ...s, rKPerW: s.rKPerW * f })) };
  }
}

function scaleSink(s: Sink, f: number): Sink {
  const out: Sink = { ...s, rthKPerW: s.rthKPerW * f };
  if (s.forcedAir) out.forcedAir = { ...s.forcedAir, points: s.forcedAir.points.map((p) => ({ ...p, rthKPerW: p.rthKPerW * f })) };
  return out;
}

function scaleSegment(s: ProfileSegment, line: number, load: number): ProfileSegment {
  const out: ProfileSegment = { ...s };
  if (load !== 1) out.powerW = Object.fromEntries(Object.entries(s.powerW).map(([id, w]) => [id, w * load]));
  if (s.electrical) out.electrical = { ...s.electrical, vinV: s.electrical.vinV * line, iloadA: s.electrical.iloadA * load };
  if (s.railDrive) out.railDrive = { ...s.railDrive, iloadA: s.railDrive.iloadA * load };
  return out;
}

/**
 * Current shares for a share error e among the pass parts in parallel: the first entry of the
 * group carries (1 + e) of the equal share and the others split the rest, so the total holds.
 * A group of one entry (count identical parts solved as one) cannot split: every part takes
 * (1 + e), a conservative bound that over-states the sink's heat by e.
 */
export function currentShares(doc: StudyDocument, group: readonly number[], e: number): Map<number, number> {
  const shares = new Map<number, number>();
  if (group.length === 0 || e === 0) return shares;
  if (group.length === 1) {
    shares.set(group[0], 1 + e);
    return shares;
  }
  const total = group.reduce((n, i) => n + doc.devices[i].count, 0);
  const first = doc.devices[group[0]].count;
  shares.set(group[0], 1 + e);
  const rest = 1 - (e * first) / (total - first);
  for (const i of group.slice(1)) shares.set(i, rest);
  return shares;
}

/**
 * The study with one run's deviations applied. Only what changes is copied: the parsed
 * document is shared between runs and never modified.
 */
export function perturbStudy(doc: StudyDocument, d: Deviations, shareGroup: readonly number[]): StudyDocument {
  const jc = 1 + (d.rthJc ?? 0);
  const sa = 1 + (d.rthSa ?? 0);
  const cs = 1 + (d.interface ?? 0);
  const line = 1 + (d.line ?? 0);
  const load = 1 + (d.load ?? 0);
  const shift = d.ambient ?? 0;
  const shares = currentShares(doc, shareGroup, d.share ?? 0);
  const out: StudyDocument = { ...doc };
  if (jc !== 1 || cs !== 1 || shares.size > 0) {
    out.devices = doc.devices.map((dev, i): Device => {
      const next: Device = { ...dev, package: jc !== 1 ? scalePackage(dev.package, jc) : dev.package, interfaceRthKPerW: dev.interfaceRthKPerW * cs };
      const share = shares.get(i);
      if (share !== undefined) next.currentShare = share;
      return next;
    });
  }
  if (sa !== 1) out.sinks = doc.sinks.map((s) => scaleSink(s, sa));
  if (shift !== 0) {
    out.ambient =
      doc.ambient.kind === 'constant'
        ? { kind: 'constant', temperatureC: doc.ambient.temperatureC + shift }
        : { ...doc.ambient, points: doc.ambient.points.map((p) => ({ ...p, temperatureC: p.temperatureC + shift })) };
  }
  if (line !== 1 || load !== 1) out.profile = { ...doc.profile, segments: doc.profile.segments.map((s) => scaleSegment(s, line, load)) };
  if (line !== 1 && doc.railPlan) out.railPlan = { ...doc.railPlan, sources: doc.railPlan.sources.map((s) => ({ ...s, vocV: s.vocV * line })) };
  return out;
}
