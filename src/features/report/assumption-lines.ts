import { AMBIENT_RAMP_STEP_K, MIN_CONVECTION_RISE_K, PERIODIC_TOLERANCE_K, type StudyDocument, type StudyResult } from '@/core/study';
import { formatNumber, formatQuantity } from '@/features/studies/quantity-format';

import { rawText } from './input-rows';

export type AssumptionGroup = { title: string; lines: string[] };

const percent = (fraction: number) => formatQuantity(fraction * 100, '%');

function solverLines(document: StudyDocument, result: StudyResult): string[] {
  const { solver } = result;
  const how =
    solver.method === 'batch'
      ? 'The study is linear, so its stretches were solved in one batch'
      : 'Thermal shutdown or natural convection makes the study non-linear, so its stretches were solved one after another, each event or change of Rθsa ending a stretch';
  const lines = [
    'Every stretch of constant inputs is solved exactly, mode by mode of the thermal RC network: no time step limits the accuracy, and peaks inside a stretch are found exactly.',
    `${how}: ${solver.stretches.toLocaleString('en-GB')} stretches, ${solver.compiledModels} compiled ${solver.compiledModels === 1 ? 'network' : 'networks'}.`,
  ];
  const periodic = solver.periodic;
  lines.push(
    periodic
      ? `Periodic steady state: the run starts where the repeated profile settles (${periodic.converged ? 'converged' : 'not converged'} after ${periodic.iterations} ${periodic.iterations === 1 ? 'iteration' : 'iterations'}, last change ${formatNumber(periodic.residualK)} K; tolerance ${PERIODIC_TOLERANCE_K} K).`
      : 'The run starts with every node at the first ambient temperature.',
  );
  if (document.ambient.kind === 'profile' && document.ambient.interpolation === 'linear') {
    lines.push(`Ambient ramps are cut into pieces whose ends differ by at most ${formatQuantity(AMBIENT_RAMP_STEP_K, 'K')}, each held at the ramp's mean over the piece.`);
  }
  return lines;
}

function sinkLines(document: StudyDocument, result: StudyResult): string[] {
  const lines: string[] = [];
  for (const sink of document.sinks) {
    if (sink.naturalConvection) {
      const nc = sink.naturalConvection;
      const range = result.sinks[sink.id]?.rthRangeKPerW;
      lines.push(
        `${sink.id}: natural convection, Rθsa(ΔT) = ${formatQuantity(sink.rthKPerW, 'K/W')} × (${formatQuantity(nc.referenceRiseK, 'K')} / ΔT)^${formatNumber(nc.exponent)}` +
          ` (laminar natural convection, h ∝ ΔT^1/4)${range ? `; ${formatNumber(range[0])}–${formatQuantity(range[1], 'K/W')} over the run` : ''}.`,
      );
    } else if (sink.forcedAir) {
      lines.push(`${sink.id}: Rθsa at ${formatQuantity(sink.forcedAir.airSpeedMPerS, 'm/s')} interpolated in log–log between the catalogue points (not extrapolated).`);
    } else {
      lines.push(`${sink.id}: fixed Rθsa of ${formatQuantity(sink.rthKPerW, 'K/W')}, whatever its rise.`);
    }
  }
  if (document.sinks.some((s) => s.naturalConvection)) {
    lines.push(
      `Natural convection is re-linearised: a stretch is split where the rise moves Rθsa by more than ${percent(result.solver.convectionTolerance)}; below a ${formatQuantity(MIN_CONVECTION_RISE_K, 'K')} rise the value at ${formatQuantity(MIN_CONVECTION_RISE_K, 'K')} is used.`,
    );
  }
  return lines;
}

function packageLines(document: StudyDocument): string[] {
  const lines = document.devices.map((device) => {
    const model = device.package;
    if (model.kind === 'foster') {
      return `${device.id}: the Foster set of ${model.terms.length} ${model.terms.length === 1 ? 'term' : 'terms'} is converted to a Cauer ladder with the same Zth(t) before it is chained to the sink, since a Foster set's inner nodes have no physical meaning.`;
    }
    if (model.kind === 'cauer') return `${device.id}: Cauer ladder as given, junction first.`;
    return `${device.id}: one resistance and one heat capacity from junction to case.`;
  });
  for (const device of document.devices) {
    if (device.count > 1) {
      lines.push(`${device.id}: ${device.count} identical parts share the current equally and stay at one temperature; every figure is that of one part.`);
    }
  }
  return lines;
}

/** What the model leaves out, so a reader knows where to add margin. */
export const NOT_MODELLED: readonly string[] = [
  'Spreading resistance and temperature differences across a sink: each sink is one node.',
  'Change of Rθjc, dropout, current limit or Iq with temperature.',
  'Radiation, except as far as the given Rθsa includes it.',
  'Heat exchanged between devices other than through the sinks and enclosure air they share.',
  'A resistive load pulling the output below the set point: the output stays where the regulator puts it.',
  'Part-to-part spreads and tolerances: the values are used as given, with no worst-case sweep.',
];

function noteLines(document: StudyDocument, raw: unknown): string[] {
  const notes: string[] = [];
  const top = rawText(raw, ['notes']);
  if (top) notes.push(top);
  const enclosure = rawText(raw, ['enclosure', 'notes']);
  if (enclosure) notes.push(`Enclosure: ${enclosure}`);
  document.devices.forEach((device, i) => {
    const note = rawText(raw, ['devices', i, 'notes']);
    if (note) notes.push(`${device.id}: ${note}`);
    const interfaceNote = rawText(raw, ['devices', i, 'interface', 'notes']);
    if (interfaceNote) notes.push(`${device.id} interface: ${interfaceNote}`);
  });
  document.sinks.forEach((sink, i) => {
    const note = rawText(raw, ['sinks', i, 'notes']);
    if (note) notes.push(`${sink.id}: ${note}`);
  });
  const rail = rawText(raw, ['railPlan', 'notes']);
  if (rail) notes.push(`Rail plan: ${rail}`);
  return notes;
}

/** The assumptions behind the figures: how they were solved, with what models and tolerances, and the study's notes. */
export function assumptionGroups(document: StudyDocument, raw: unknown, result: StudyResult): AssumptionGroup[] {
  const groups: AssumptionGroup[] = [
    { title: 'Solver', lines: solverLines(document, result) },
    { title: 'Sinks and air', lines: sinkLines(document, result) },
    { title: 'Package models', lines: packageLines(document) },
    { title: 'Not modelled', lines: [...NOT_MODELLED] },
  ];
  const notes = noteLines(document, raw);
  if (notes.length) groups.push({ title: 'Notes in the study', lines: notes });
  return groups;
}
