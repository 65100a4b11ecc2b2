/** The study document (format "junctura-study" v1) and the pipeline that evaluates it. */
export * from './types';
export { parseStudy } from './parse-study';
export { evaluateStudy } from './evaluate-study';
export type { EvaluateOptions } from './evaluate-study';
export type { StudyResult, DeviceResult, SinkResult, PeakRow } from './result-types';
export type { StudyEvent, EventKind } from './event-log';
export type { Series } from './series-recorder';
export type { BoundaryTable } from './boundary-table';
export { SPECIFIC_HEAT_J_PER_KG_K, SINK_MATERIALS } from './materials';
export type { SinkMaterial } from './materials';
export { naturalConvectionRsa, interpolateLogLog, sinkRsa } from './convection';
export { DEFAULT_CONVECTION_EXPONENT } from './parse-sink';
export { buildStudyNetwork, packageStages } from './build-network';
export { ambientIntervals } from './ambient-intervals';
export * from './constants';
