/**
 * Rows of node temperatures at solved boundaries (time, then one value per column), kept
 * up to maxRows; later rows are counted but dropped.
 */
export type BoundaryTable = {
  columns: string[];
  /** rows × (1 + columns.length), row-major: time_s then the columns, °C. */
  values: Float64Array;
  rows: number;
  /** Rows that did not fit. */
  dropped: number;
};

export type BoundaryWriter = {
  push(t: number, fill: (row: Float64Array, offset: number) => void): void;
  table(): BoundaryTable;
};

export function createBoundaryWriter(columns: string[], maxRows: number): BoundaryWriter {
  const width = columns.length + 1;
  let values = new Float64Array(width * Math.min(maxRows, 1024));
  let rows = 0;
  let dropped = 0;
  let lastT = NaN;
  return {
    push(t, fill) {
      if (t === lastT) return;
      if (rows >= maxRows) {
        dropped++;
        return;
      }
      if ((rows + 1) * width > values.length) {
        const grown = new Float64Array(Math.min(maxRows * width, values.length * 2));
        grown.set(values);
        values = grown;
      }
      values[rows * width] = t;
      fill(values, rows * width + 1);
      rows++;
      lastT = t;
    },
    table: () => ({ columns, values: values.subarray(0, rows * width), rows, dropped }),
  };
}
