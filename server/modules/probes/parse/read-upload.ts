import { probeLimits, type ProbeFormat } from "../../../../shared/schemas/probes";
import { parseCsvTable } from "./csv";
import { parseMtxTable } from "./mtx";
import { parseNpyTable } from "./npy";
import { squareOf, uploadProblem, vectorOf, type SquareMatrix, type Table, type UploadField } from "./table";

/** An uploaded file as multer's memory storage hands it over. */
export interface UploadedFile {
  originalname: string;
  buffer: Buffer;
}

const READERS: Record<ProbeFormat, (bytes: Uint8Array, field: UploadField) => Table> = {
  csv: parseCsvTable,
  npy: parseNpyTable,
  mtx: parseMtxTable,
};

/**
 * The format a file name announces by its extension.
 * @throws InvalidError naming the extension when it is not .csv, .npy or .mtx
 */
export function formatOf(fileName: string, field: UploadField): ProbeFormat {
  const dot = fileName.lastIndexOf(".");
  const ext = dot > 0 ? fileName.slice(dot).toLowerCase() : "";
  const format = ext.slice(1);
  if (format === "csv" || format === "npy" || format === "mtx") return format;
  const named = ext ? `extension "${ext}"` : "no extension";
  throw uploadProblem(field, `the file "${fileName}" has ${named}; use ${probeLimits.extensions.join(", ")}`);
}

function tableOf(file: UploadedFile, field: UploadField): { format: ProbeFormat; table: Table } {
  const format = formatOf(file.originalname, field);
  const bytes = new Uint8Array(file.buffer.buffer, file.buffer.byteOffset, file.buffer.byteLength);
  return { format, table: READERS[format](bytes, field) };
}

/**
 * Reads the uploaded coupling matrix in the format its extension names.
 * @returns format and { n, data } row-major
 * @throws InvalidError naming the problem (extension, parse error with row/column, not square,
 *   N above probeLimits.maxN)
 */
export function readMatrixUpload(file: UploadedFile): { format: ProbeFormat } & SquareMatrix {
  const { format, table } = tableOf(file, "matrix");
  const m = squareOf(table);
  if (m.n > probeLimits.maxN) throw uploadProblem("matrix", `N = ${m.n} is over the limit of ${probeLimits.maxN} units`);
  return { format, ...m };
}

/**
 * Reads the optional constant input vector I (one value per unit): a row or a column.
 * @throws InvalidError naming the problem (extension, parse error, wrong length)
 */
export function readInputUpload(file: UploadedFile, n: number): Float64Array {
  return vectorOf(tableOf(file, "input").table, n);
}
