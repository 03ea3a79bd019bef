import { assertFiniteTable, squareOf, uploadProblem, type SquareMatrix, type Table, type UploadField } from "./table";

// Matrix Market exchange format, after "The Matrix Market Exchange Formats: Initial Design",
// R. F. Boisvert, R. Pozo & K. Remington, NISTIR 5935 (NIST, 1996), section 3: a banner
// "%%MatrixMarket matrix <coordinate|array> <field> <symmetry>", comment lines starting with
// "%", a size line ("rows cols entries" for coordinate, "rows cols" for array), then the
// entries: "i j value" with 1-based indices (coordinate), or every value in column-major order
// (array); symmetric and skew-symmetric matrices store only the lower triangle.

type Symmetry = "general" | "symmetric" | "skew-symmetric";

interface Banner {
  format: "coordinate" | "array";
  symmetry: Symmetry;
}

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const INDEX = /^\d+$/;

function readBanner(line: string | undefined, field: UploadField): Banner {
  const words = (line ?? "").trim().split(/\s+/);
  if (words[0]?.toLowerCase() !== "%%matrixmarket") throw uploadProblem(field, "missing the \"%%MatrixMarket matrix …\" banner on the first line");
  const [object, format, kind, symmetry] = words.slice(1).map((w) => w.toLowerCase());
  if (object !== "matrix") throw uploadProblem(field, `the banner names object ${JSON.stringify(object ?? "")}, expected "matrix"`);
  if (format !== "coordinate" && format !== "array") throw uploadProblem(field, `the banner names format ${JSON.stringify(format ?? "")}, expected "coordinate" or "array"`);
  if (kind === "complex") throw uploadProblem(field, "complex matrices are not supported: couplings must be real");
  if (kind === "pattern") throw uploadProblem(field, "a pattern matrix carries no values: write the couplings as real");
  if (kind !== "real" && kind !== "integer" && kind !== "double") throw uploadProblem(field, `the banner names field ${JSON.stringify(kind ?? "")}, expected "real" or "integer"`);
  if (symmetry !== "general" && symmetry !== "symmetric" && symmetry !== "skew-symmetric") {
    throw uploadProblem(field, `the banner names symmetry ${JSON.stringify(symmetry ?? "")}, expected "general", "symmetric" or "skew-symmetric"`);
  }
  return { format, symmetry };
}

function value(raw: string | undefined, where: string, field: UploadField): number {
  if (raw !== undefined && NUMBER.test(raw)) return Number(raw);
  if (raw !== undefined && /^[+-]?(nan|inf|infinity)$/i.test(raw)) throw uploadProblem(field, `${where}: ${raw} is not allowed; every entry must be a finite number`);
  throw uploadProblem(field, `${where}: ${JSON.stringify(raw ?? "")} is not a number`);
}

function sizeOf(words: string[], want: number, field: UploadField): number[] {
  if (words.length !== want || !words.every((w) => INDEX.test(w))) {
    throw uploadProblem(field, `the size line must hold ${want === 3 ? "rows, columns and the number of entries" : "rows and columns"}, got ${JSON.stringify(words.join(" "))}`);
  }
  return words.map(Number);
}

function set(t: Table, i: number, j: number, v: number, symmetry: Symmetry): void {
  t.data[i * t.cols + j] = v;
  if (symmetry !== "general" && i !== j) t.data[j * t.cols + i] = symmetry === "symmetric" ? v : -v;
}

function checkTriangle(i: number, j: number, symmetry: Symmetry, where: string, field: UploadField): void {
  if (symmetry === "symmetric" && j > i) throw uploadProblem(field, `${where} at (${i + 1}, ${j + 1}) lies above the diagonal; a symmetric file stores the lower triangle only`);
  if (symmetry === "skew-symmetric" && j >= i) throw uploadProblem(field, `${where} at (${i + 1}, ${j + 1}) is not below the diagonal; a skew-symmetric file stores the strict lower triangle only`);
}

function countProblem(promised: number, got: number, field: UploadField): never {
  throw uploadProblem(field, `wrong count: the size line promises ${promised} entries, the file has ${got}`);
}

function readCoordinate(lines: string[][], b: Banner, field: UploadField): Table {
  const [rows, cols, count] = sizeOf(lines[0] ?? [], 3, field);
  const entries = lines.slice(1);
  if (entries.length !== count) countProblem(count, entries.length, field);
  const t: Table = { rows, cols, data: new Float64Array(rows * cols) };
  const seen = new Set<number>();
  entries.forEach((words, k) => {
    const where = `entry ${k + 1}`;
    if (words.length !== 3) throw uploadProblem(field, `${where} must be "row column value", got ${JSON.stringify(words.join(" "))}`);
    const [i, j] = words.slice(0, 2).map((w) => (INDEX.test(w) ? Number(w) - 1 : -1));
    if (i < 0 || i >= rows) throw uploadProblem(field, `${where}: row ${words[0]} is outside 1…${rows}`);
    if (j < 0 || j >= cols) throw uploadProblem(field, `${where}: column ${words[1]} is outside 1…${cols}`);
    checkTriangle(i, j, b.symmetry, where, field);
    if (seen.has(i * cols + j)) throw uploadProblem(field, `${where} repeats position (${i + 1}, ${j + 1})`);
    seen.add(i * cols + j);
    set(t, i, j, value(words[2], where, field), b.symmetry);
  });
  return t;
}

/** Column-major positions an array file stores, lower triangle only for the symmetric kinds. */
function arrayPositions(rows: number, cols: number, symmetry: Symmetry): [number, number][] {
  const out: [number, number][] = [];
  for (let j = 0; j < cols; j++) {
    const from = symmetry === "general" ? 0 : symmetry === "symmetric" ? j : j + 1;
    for (let i = from; i < rows; i++) out.push([i, j]);
  }
  return out;
}

function readArray(lines: string[][], b: Banner, field: UploadField): Table {
  const [rows, cols] = sizeOf(lines[0] ?? [], 2, field);
  if (b.symmetry !== "general" && rows !== cols) throw uploadProblem(field, `a ${b.symmetry} matrix must be square, the size line says ${rows} × ${cols}`);
  const values = lines.slice(1).flat();
  const positions = arrayPositions(rows, cols, b.symmetry);
  if (values.length !== positions.length) countProblem(positions.length, values.length, field);
  const t: Table = { rows, cols, data: new Float64Array(rows * cols) };
  positions.forEach(([i, j], k) => set(t, i, j, value(values[k], `value ${k + 1} (row ${i + 1}, column ${j + 1})`, field), b.symmetry));
  return t;
}

/**
 * Reads a Matrix Market file (NISTIR 5935): coordinate or array format, real or integer
 * values, general, symmetric or skew-symmetric. Blank lines are skipped.
 * @param bytes the uploaded file
 * @param field which upload it is (named in messages)
 * @returns the dense table, row-major
 * @throws InvalidError naming the problem: missing or unsupported banner (complex, pattern),
 *   bad size line, wrong entry count, an index out of range, a repeated entry, an entry above
 *   the stored triangle, a non-numeric or non-finite value
 */
export function parseMtxTable(bytes: Uint8Array, field: UploadField): Table {
  const text = new TextDecoder("utf-8").decode(bytes);
  const all = text.split(/\r?\n/);
  if (all.every((l) => l.trim() === "")) throw uploadProblem(field, "the file is empty");
  const banner = readBanner(all[0], field);
  const lines = all.slice(1).filter((l) => l.trim() !== "" && !l.trimStart().startsWith("%")).map((l) => l.trim().split(/\s+/));
  const t = banner.format === "coordinate" ? readCoordinate(lines, banner, field) : readArray(lines, banner, field);
  return assertFiniteTable(t, field);
}

/**
 * Reads a square coupling matrix from a Matrix Market upload (see parseMtxTable).
 * @returns { n, data } row-major
 * @throws InvalidError as parseMtxTable, or when the matrix is not square
 */
export function parseMtxMatrix(bytes: Uint8Array): SquareMatrix {
  return squareOf(parseMtxTable(bytes, "matrix"));
}
