import { convectionExponentFromRatings, flatPlateAtRise, type EstimateNotes, type ValidityCheck } from '@/core/heatsink';
import { formatNumber } from '@/features/studies/quantity-format';

import { checkRange, formatCheckValue, mergeNotes } from './check-format';
import type { FlatPlateDesign } from './flat-plate-estimate';
import { plateFinRating, type PlateFinEstimate } from './plate-fin-estimate';

/** The catalogue's notes field holds at most this many characters (shared heatsink schema). */
const NOTES_LIMIT = 4000;

const mm = (m: number) => formatNumber(m * 1e3);

/** A validity check for the notes: "fin Biot number 0.004, valid at most 0.1: in range (basis)". */
export function checkText(c: ValidityCheck): string {
  return `${c.quantity} ${formatCheckValue(c.value)}, valid ${checkRange(c)}: ${c.inRange ? 'in range' : 'OUT OF RANGE'} (${c.basis})`;
}

function notesText(head: string[], estimates: EstimateNotes[]): string {
  const assumptions = [...new Set(estimates.flatMap((e) => e.assumptions))];
  const checks = estimates.flatMap((e) => e.validity).map(checkText);
  const text = [...head, 'Assumptions:', ...assumptions.map((a) => `- ${a}`), 'Validity checks:', ...checks.map((c) => `- ${c}`)].join('\n');
  return text.length <= NOTES_LIMIT ? text : `${text.slice(0, NOTES_LIMIT - 1)}…`;
}

const ESTIMATE_HEAD = 'Estimate from geometry, not a measurement: confirm it by measurement before relying on it.';

/** The body of `POST /api/heatsinks` for a plate-fin design rated at referenceRiseK. */
export function plateFinCatalogueBody(name: string, estimate: PlateFinEstimate, referenceRiseK: number, teamId?: number): Record<string, unknown> {
  const { candidate, natural, forced } = plateFinRating(estimate, referenceRiseK);
  const g = estimate.geometry;
  const exponent = candidate.natural?.exponent ?? 0.25;
  const head = [
    ESTIMATE_HEAD,
    `Still air: Rθsa ${formatNumber(natural.rsaKPerW)} K/W at a ${formatNumber(referenceRiseK)} K rise in ${formatNumber(natural.ambientC)} °C ambient; the model's own rise exponent n = ${formatNumber(exponent)} is kept as the sink's convection exponent.`,
    forced.length ? `Forced air: ${forced.map((f) => `${formatNumber(f.rsaKPerW)} K/W at ${formatNumber(f.airSpeedMPerS)} m/s`).join(', ')} (ducted laminar flow).` : 'No forced-air points.',
  ];
  return {
    ...(teamId === undefined ? {} : { teamId }),
    name,
    description: `Plate-fin extrusion estimated from its geometry: ${mm(g.baseWidthM)} × ${mm(g.lengthM)} mm base ${mm(g.baseThicknessM)} mm thick, ${g.finCount} fins ${mm(g.finHeightM)} mm tall and ${mm(g.finThicknessM)} mm thick, ${g.material}, emissivity ${formatNumber(g.emissivity)}.`,
    rthKPerW: natural.rsaKPerW,
    referenceRiseK,
    convectionExponent: exponent,
    forcedAir: (candidate.forcedAir ?? []).map((p) => ({ airSpeedMPerS: p.airSpeedMPerS, rthKPerW: p.rthKPerW })),
    massKg: candidate.massKg ?? estimate.massKg,
    material: g.material,
    capacityJPerK: candidate.capacityJPerK ?? estimate.capacityJPerK,
    widthMm: g.baseWidthM * 1e3,
    lengthMm: g.lengthM * 1e3,
    heightMm: (g.baseThicknessM + g.finHeightM) * 1e3,
    devicesPerSink: 1,
    price: null,
    notes: notesText(head, [natural, mergeNotes(forced.map((f) => ({ notes: f, label: `${formatNumber(f.airSpeedMPerS)} m/s` })))]),
  };
}

/** The body of `POST /api/heatsinks` for a flat plate or copper area, rated with its spreading penalty (the safer figure). */
export function flatPlateCatalogueBody(name: string, design: FlatPlateDesign, referenceRiseK: number, teamId?: number): Record<string, unknown> {
  const g = design.geometry;
  const rated = flatPlateAtRise(g, referenceRiseK, { ambientC: design.natural.ambientC });
  // The model's own rise exponent, as for a plate-fin: n = ln(R(ΔT/2)/R(ΔT)) / ln 2, spreading included.
  const half = flatPlateAtRise(g, referenceRiseK / 2, { ambientC: design.natural.ambientC });
  const n = convectionExponentFromRatings({ rthKPerW: half.rsaWithSpreadingKPerW, riseK: referenceRiseK / 2 }, { rthKPerW: rated.rsaWithSpreadingKPerW, riseK: referenceRiseK });
  const exponent = n >= 0 && n <= 1 ? n : null;
  const head = [
    ESTIMATE_HEAD,
    `Still air: Rθsa ${formatNumber(rated.rsaWithSpreadingKPerW)} K/W at a ${formatNumber(referenceRiseK)} K rise in ${formatNumber(rated.ambientC)} °C ambient, spreading included (isothermal plate: ${formatNumber(rated.rsaKPerW)} K/W, spreading efficiency ${formatNumber(rated.spreadingEfficiency)}); ${
      exponent === null ? `the model's own rise exponent, ${formatNumber(n)}, lies outside 0…1 and is not kept` : `the model's own rise exponent n = ${formatNumber(exponent)} is kept as the sink's convection exponent`
    }.`,
  ];
  return {
    ...(teamId === undefined ? {} : { teamId }),
    name,
    description: `${g.material === 'copper' ? 'Copper' : 'Aluminium'} plate estimated from its geometry: ${mm(g.heightM)} mm tall, ${mm(g.widthM)} mm wide, ${mm(g.thicknessM)} mm thick, ${g.faces === 1 ? 'one face' : 'both faces'} shedding heat, emissivity ${formatNumber(g.emissivity)}.`,
    rthKPerW: rated.rsaWithSpreadingKPerW,
    referenceRiseK,
    convectionExponent: exponent,
    forcedAir: [],
    massKg: design.massKg,
    material: g.material,
    capacityJPerK: rated.capacityJPerK,
    widthMm: g.widthM * 1e3,
    lengthMm: g.heightM * 1e3,
    heightMm: g.thicknessM * 1e3,
    devicesPerSink: 1,
    price: null,
    notes: notesText(head, [rated]),
  };
}
