import { InvalidError } from "../../../lib/errors";

/** A dense real table read from an upload, row-major. */
export interface Table {
  rows: number;
  cols: number;
  data: Float64Array;
}

/** A square coupling matrix, row-major N × N. */
export interface SquareMatrix {
  n: number;
  data: Float64Array;
}

/** Which upload a problem concerns: the multipart field name. */
export type UploadField = "matrix" | "input";

/** The InvalidError of a bad upload: one issue on the field, the message naming the problem. */
export function uploadProblem(field: UploadField, message: string): InvalidError {
  const text = `${field === "matrix" ? "Coupling matrix" : "Input vector"}: ${message}`;
  return new InvalidError(text, [{ path: field, message: text }]);
}

/** Where entry k of a row-major table sits, 1-based, as people count rows and columns. */
export function cellName(k: number, cols: number): string {
  return `row ${Math.floor(k / cols) + 1}, column ${(k % cols) + 1}`;
}

/**
 * Checks every entry is finite.
 * @throws InvalidError naming the first NaN or infinite entry by row and column
 */
export function assertFiniteTable(t: Table, field: UploadField): Table {
  for (let k = 0; k < t.data.length; k++) {
    const v = t.data[k];
    if (!Number.isFinite(v)) throw uploadProblem(field, `${cellName(k, t.cols)} is ${Number.isNaN(v) ? "NaN" : v > 0 ? "infinity" : "minus infinity"}; every entry must be a finite number`);
  }
  return t;
}

/**
 * The table as a square matrix.
 * @throws InvalidError when it is empty or not square
 */
export function squareOf(t: Table): SquareMatrix {
  if (t.rows === 0 || t.cols === 0) throw uploadProblem("matrix", "the file holds no entries");
  if (t.rows !== t.cols) throw uploadProblem("matrix", `not square: ${t.rows} rows × ${t.cols} columns`);
  return { n: t.rows, data: t.data };
}

/**
 * The table as a vector of length n: one row or one column.
 * @throws InvalidError when it has another shape or length
 */
export function vectorOf(t: Table, n: number): Float64Array {
  if (t.rows !== 1 && t.cols !== 1) throw uploadProblem("input", `expected one row or one column of ${n} values, got ${t.rows} rows × ${t.cols} columns`);
  if (t.data.length !== n) throw uploadProblem("input", `expected ${n} values (one per unit, N = ${n}), got ${t.data.length}`);
  return t.data;
}
