export { nnls } from './nnls';
export type { NnlsResult } from './nnls';
export { fitFoster } from './fit-foster';
export type { FosterFit, FosterFitOptions, FosterTermFit, ZthPoint } from './fit-foster';
