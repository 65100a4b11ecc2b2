import { CholeskyDecomposition, Matrix } from 'ml-matrix';

/** Row-major Float64Array ⇄ ml-matrix helpers and a symmetric positive definite solve. */
export function toMatrix(data: Float64Array, rows: number, cols: number): Matrix {
  const m = new Matrix(rows, cols);
  for (let i = 0; i < rows; i++) for (let j = 0; j < cols; j++) m.set(i, j, data[i * cols + j]);
  return m;
}

export function fromMatrix(m: Matrix): Float64Array {
  const out = new Float64Array(m.rows * m.columns);
  for (let i = 0; i < m.rows; i++) for (let j = 0; j < m.columns; j++) out[i * m.columns + j] = m.get(i, j);
  return out;
}

/** X = A⁻¹ B for symmetric positive definite A (n × n) and B (n × cols), row-major. */
export function solveSpd(a: Float64Array, n: number, b: Float64Array, cols: number, what: string): Float64Array {
  if (n === 0) return new Float64Array(0);
  const chol = new CholeskyDecomposition(toMatrix(a, n, n));
  if (!chol.isPositiveDefinite()) throw new RangeError(`${what}: conductance matrix is singular`);
  return fromMatrix(chol.solve(toMatrix(b, n, cols)));
}
