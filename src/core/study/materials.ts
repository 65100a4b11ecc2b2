/**
 * Specific heat of heatsink materials near room temperature, J/(kg·K): Incropera & DeWitt,
 * Fundamentals of Heat and Mass Transfer, Table A.1 (aluminium alloys ≈ 900, copper 385).
 */
export const SPECIFIC_HEAT_J_PER_KG_K = {
  aluminium: 900,
  copper: 385,
} as const;

export type SinkMaterial = keyof typeof SPECIFIC_HEAT_J_PER_KG_K;

export const SINK_MATERIALS = Object.keys(SPECIFIC_HEAT_J_PER_KG_K) as SinkMaterial[];
