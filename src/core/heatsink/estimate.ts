/** One limit an estimate rests on, checked for the case at hand. */
export type ValidityCheck = {
  quantity: string;
  value: number;
  /** Bounds of the valid range; null where it is open. */
  min: number | null;
  max: number | null;
  inRange: boolean;
  /** Where the limit comes from. */
  basis: string;
};

/** Assumptions and validity checks that travel with every geometry estimate. */
export type EstimateNotes = {
  assumptions: string[];
  validity: ValidityCheck[];
  /** True when every check is in range. */
  withinRange: boolean;
};

export function validity(quantity: string, value: number, min: number | null, max: number | null, basis: string): ValidityCheck {
  return { quantity, value, min, max, inRange: (min === null || value >= min) && (max === null || value <= max), basis };
}

export function notes(assumptions: string[], checks: ValidityCheck[]): EstimateNotes {
  return { assumptions, validity: checks, withinRange: checks.every((c) => c.inRange) };
}
