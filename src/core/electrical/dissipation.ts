/**
 * Dissipation in a linear pass element, W: P = (Vin − Vout)·I + Vin·Iq (PHYSICS.md §1,
 * textbook). Iq is the input current that does not reach the load (quiescent, ground or
 * drive current).
 */
export function passDissipationW(vinV: number, voutV: number, currentA: number, iqA: number): number {
  return (vinV - voutV) * currentA + vinV * iqA;
}
