/** One row of `GET /api/heatsinks`. Lengths in mm, mass in kg, Rθ in K/W. */
export type Heatsink = {
  id: number;
  teamId: number;
  name: string;
  description: string;
  /** Rθsa in still air at the reference rise. */
  rthKPerW: number;
  referenceRiseK: number;
  /** n of Rθsa(ΔT) = Rθsa,ref (ΔTref/ΔT)^n in still air; null for the laminar default, 1/4. */
  convectionExponent: number | null;
  forcedAir: { airSpeedMPerS: number; rthKPerW: number }[];
  massKg: number | null;
  material: 'aluminium' | 'copper' | null;
  capacityJPerK: number | null;
  widthMm: number | null;
  lengthMm: number | null;
  heightMm: number | null;
  devicesPerSink: number;
  price: number | null;
  notes: string;
  isDemo: boolean;
  updatedAt: string;
};
