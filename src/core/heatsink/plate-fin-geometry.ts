import { checkInteger, checkObject, checkPositive, checkRange } from './check';
import { checkMaterial, SINK_MATERIALS, type SinkMaterial } from './materials';

/**
 * A plate-fin extrusion, fins vertical: a base baseWidthM wide and lengthM long (the fins'
 * length, along gravity or the air flow), baseThicknessM thick, carrying finCount straight fins
 * finHeightM tall and finThicknessM thick across the width. conductivityWPerMK defaults to the
 * material's. emissivity of the surface (anodised ≈ 0.8–0.9, bare ≈ 0.05–0.1; from memory).
 */
export type PlateFinGeometry = {
  baseWidthM: number;
  lengthM: number;
  baseThicknessM: number;
  finCount: number;
  finHeightM: number;
  finThicknessM: number;
  material: SinkMaterial;
  conductivityWPerMK?: number;
  emissivity: number;
  orientation?: 'vertical-fins';
};

/** Checked geometry with the derived spacing, areas and volumes. */
export type PlateFinShape = Required<Omit<PlateFinGeometry, 'orientation'>> & {
  /** Gap between neighbouring fins, m. */
  spacingM: number;
  /** Fin height corrected for tip convection, H + t/2, m (Incropera & DeWitt §3.6). */
  correctedFinHeightM: number;
  /** Surface of one fin with its tip, 2 (H + t/2) L, and the channel floors between fins, m². */
  finAreaEachM2: number;
  channelFloorAreaM2: number;
  /** Bounding box without the mounting face: front, two sides, top and bottom, m². */
  envelopeAreaM2: number;
  /** Metal volume and the bounding-box volume, m³. */
  metalVolumeM3: number;
  envelopeVolumeM3: number;
};

export function checkPlateFin(value: unknown, path = 'geometry'): PlateFinShape {
  const g = checkObject(value, path);
  if (g.orientation !== undefined && g.orientation !== 'vertical-fins') {
    throw new RangeError(`${path}.orientation: only "vertical-fins" is modelled (the parallel-plate correlation is for vertical channels)`);
  }
  const material = checkMaterial(g.material, `${path}.material`);
  const shape = {
    baseWidthM: checkPositive(g.baseWidthM, `${path}.baseWidthM`),
    lengthM: checkPositive(g.lengthM, `${path}.lengthM`),
    baseThicknessM: checkPositive(g.baseThicknessM, `${path}.baseThicknessM`),
    finCount: checkInteger(g.finCount, `${path}.finCount`, 2),
    finHeightM: checkPositive(g.finHeightM, `${path}.finHeightM`),
    finThicknessM: checkPositive(g.finThicknessM, `${path}.finThicknessM`),
    material,
    conductivityWPerMK:
      g.conductivityWPerMK === undefined ? SINK_MATERIALS[material].conductivityWPerMK : checkPositive(g.conductivityWPerMK, `${path}.conductivityWPerMK`),
    emissivity: checkRange(g.emissivity, `${path}.emissivity`, 0, 1),
  };
  const { baseWidthM: W, lengthM: L, baseThicknessM: tb, finCount: N, finHeightM: H, finThicknessM: t } = shape;
  const spacingM = (W - N * t) / (N - 1);
  if (!(spacingM > 0)) {
    throw new RangeError(`${path}.finCount: ${N} fins of ${t * 1e3} mm do not fit on a ${W * 1e3} mm base (no gap left between them)`);
  }
  return {
    ...shape,
    spacingM,
    correctedFinHeightM: H + t / 2,
    finAreaEachM2: 2 * (H + t / 2) * L,
    channelFloorAreaM2: (N - 1) * spacingM * L,
    envelopeAreaM2: W * L + 2 * (H + tb) * L + 2 * W * (H + tb),
    metalVolumeM3: W * L * tb + N * t * H * L,
    envelopeVolumeM3: W * L * (H + tb),
  };
}
