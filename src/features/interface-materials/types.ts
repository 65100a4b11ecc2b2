/** One row of `GET /api/interface-materials`: a typical Rθcs per package, or bulk values per area. */
export type InterfaceMaterial = {
  id: number;
  teamId: number;
  name: string;
  kind: 'per_package' | 'per_area';
  packageName: string | null;
  /** Rθcs, K/W (per package). */
  rthKPerW: number | null;
  conductivityWPerMK: number | null;
  thicknessMm: number | null;
  /** Contact resistance of both faces together, K·cm²/W. */
  contactKCm2PerW: number | null;
  notes: string;
  isDemo: boolean;
  updatedAt: string;
};
