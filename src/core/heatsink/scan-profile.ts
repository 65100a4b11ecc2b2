/**
 * A piecewise-constant profile laid out once for scanning many models: durations, row-major
 * inputs u = [P_1 … P_m, Ta] per segment, and each segment's index into the distinct
 * durations and the distinct input rows, so that per model e^(−λh) is computed once per
 * distinct length and the modal equilibrium x∞ = F u once per distinct input.
 */
export type ScanProfile = {
  durations: Float64Array;
  inputs: Float64Array;
  inputCount: number;
  durationIndex: Int32Array;
  distinctDurations: Float64Array;
  rowIndex: Int32Array;
  /** Distinct input rows, row-major (rows × inputCount). */
  distinctRows: Float64Array;
  totalTimeS: number;
};

export function scanProfile(durations: Float64Array, inputs: Float64Array, inputCount: number): ScanProfile {
  if (inputs.length !== durations.length * inputCount) {
    throw new RangeError(`inputs: expected ${durations.length} × ${inputCount} values, got ${inputs.length}`);
  }
  if (durations.length === 0) throw new RangeError('durations: at least one segment is required');
  const index = new Int32Array(durations.length);
  const seen = new Map<number, number>();
  const distinct: number[] = [];
  let total = 0;
  for (let s = 0; s < durations.length; s++) {
    const h = durations[s];
    if (!(h >= 0 && h < Infinity)) throw new RangeError(`durations[${s}]: must be finite and ≥ 0, got ${h}`);
    total += h;
    let k = seen.get(h);
    if (k === undefined) {
      k = distinct.length;
      distinct.push(h);
      seen.set(h, k);
    }
    index[s] = k;
  }
  const rowIndex = new Int32Array(durations.length);
  const rows = new Map<string, number>();
  const rowStarts: number[] = [];
  for (let s = 0; s < durations.length; s++) {
    const key = Array.prototype.join.call(inputs.subarray(s * inputCount, (s + 1) * inputCount), ',');
    let r = rows.get(key);
    if (r === undefined) {
      r = rowStarts.length;
      rowStarts.push(s);
      rows.set(key, r);
    }
    rowIndex[s] = r;
  }
  const distinctRows = new Float64Array(rowStarts.length * inputCount);
  rowStarts.forEach((s, r) => distinctRows.set(inputs.subarray(s * inputCount, (s + 1) * inputCount), r * inputCount));
  return {
    durations,
    inputs,
    inputCount,
    durationIndex: index,
    distinctDurations: Float64Array.from(distinct),
    rowIndex,
    distinctRows,
    totalTimeS: total,
  };
}
