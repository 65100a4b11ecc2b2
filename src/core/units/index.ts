export { parseQuantity, formatQuantity, UNITS } from './quantities';
export type { ParsedQuantity, UnitKind, UnitSpec } from './quantities';
