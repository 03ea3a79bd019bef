import { parseNpy } from "../../../engine/io/npy";
import { assertFiniteTable, squareOf, uploadProblem, type SquareMatrix, type Table, type UploadField } from "./table";

/**
 * Reads a NumPy .npy upload through the engine's reader (server/engine/io/npy.ts: float64 or
 * float32, little-endian, C order, 1-D or 2-D); a 1-D array is one row.
 * @param bytes the uploaded file
 * @param field which upload it is (named in messages)
 * @returns the table, row-major
 * @throws InvalidError naming the problem: complex or integer dtype, big-endian, Fortran order,
 *   truncated data, bad header, NaN or infinity (by row and column)
 */
export function parseNpyTable(bytes: Uint8Array, field: UploadField): Table {
  let shape: number[];
  let data: Float64Array;
  try {
    ({ shape, data } = parseNpy(bytes));
  } catch (e) {
    throw uploadProblem(field, (e as Error).message);
  }
  const [rows, cols] = shape.length === 1 ? [1, shape[0]] : [shape[0], shape[1]];
  return assertFiniteTable({ rows, cols, data }, field);
}

/**
 * Reads a square coupling matrix from a .npy upload (see parseNpyTable).
 * @returns { n, data } row-major
 * @throws InvalidError as parseNpyTable, or when the array is empty or not square (a 1-D array is one row)
 */
export function parseNpyMatrix(bytes: Uint8Array): SquareMatrix {
  return squareOf(parseNpyTable(bytes, "matrix"));
}
