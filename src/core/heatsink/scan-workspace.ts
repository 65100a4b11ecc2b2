/**
 * Buffers reused from one scan to the next, grown on demand: per distinct duration and mode
 * e^(−λh); per segment the modal state where a segment was set aside for an interior search;
 * per watched node the set-aside segments with their bounds and start times.
 */
export type ScanWorkspace = {
  decay: Float64Array;
  /** Per distinct input row: x∞ (n values) and each watched node's steady value. */
  equilibrium: Float64Array;
  steady: Float64Array;
  snapshots: Float64Array;
  candidateSegment: Int32Array;
  candidateBound: Float64Array;
  candidateTime: Float64Array;
};

export function createScanWorkspace(): ScanWorkspace {
  return {
    decay: new Float64Array(0),
    equilibrium: new Float64Array(0),
    steady: new Float64Array(0),
    snapshots: new Float64Array(0),
    candidateSegment: new Int32Array(0),
    candidateBound: new Float64Array(0),
    candidateTime: new Float64Array(0),
  };
}

export function reserveScanWorkspace(ws: ScanWorkspace, distinct: number, rows: number, segments: number, modes: number, watched: number): void {
  if (ws.decay.length < distinct * modes) ws.decay = new Float64Array(distinct * modes);
  if (ws.equilibrium.length < rows * modes) ws.equilibrium = new Float64Array(rows * modes);
  if (ws.steady.length < rows * watched) ws.steady = new Float64Array(rows * watched);
  if (ws.snapshots.length < segments * modes) ws.snapshots = new Float64Array(segments * modes);
  if (ws.candidateSegment.length < segments * watched) {
    ws.candidateSegment = new Int32Array(segments * watched);
    ws.candidateBound = new Float64Array(segments * watched);
    ws.candidateTime = new Float64Array(segments * watched);
  }
}
