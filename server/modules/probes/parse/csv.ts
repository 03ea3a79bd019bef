import { assertFiniteTable, squareOf, uploadProblem, type SquareMatrix, type Table, type UploadField } from "./table";

const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;
const NON_FINITE = /^[+-]?(nan|inf|infinity)$/i;

/** Decodes the upload as UTF-8 text (a leading byte-order mark is dropped). */
function decodeText(bytes: Uint8Array, field: UploadField): string {
  let text: string;
  try {
    text = new TextDecoder("utf-8", { fatal: true }).decode(bytes);
  } catch {
    throw uploadProblem(field, "the .csv file is not UTF-8 text");
  }
  return text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
}

function splitterFor(line: string): (line: string) => string[] {
  for (const sep of [",", ";", "\t"]) if (line.includes(sep)) return (l) => l.split(sep).map((s) => s.trim());
  return (l) => l.trim().split(/\s+/);
}

function token(raw: string, where: string, field: UploadField): number {
  if (raw === "") throw uploadProblem(field, `${where} is empty`);
  if (NUMBER.test(raw)) return Number(raw);
  if (NON_FINITE.test(raw)) return /nan/i.test(raw) ? Number.NaN : raw.startsWith("-") ? -Infinity : Infinity;
  throw uploadProblem(field, `${where}: ${JSON.stringify(raw.length > 40 ? `${raw.slice(0, 40)}…` : raw)} is not a number`);
}

function looksLikeHeader(cells: string[]): boolean {
  return cells.length > 0 && cells.every((c) => c !== "" && !NUMBER.test(c) && !NON_FINITE.test(c));
}

/**
 * Reads a CSV table of numbers: one matrix row per line, values separated by commas (or
 * semicolons, tabs, spaces — whichever the first row uses); lines starting with "#" are
 * comments; trailing blank lines are ignored. Common practice for numeric CSV (numpy.savetxt
 * writes this form).
 * @param bytes the uploaded file
 * @param field which upload it is (named in messages)
 * @returns the table, row-major
 * @throws InvalidError naming the problem and its row/column: empty file, a header row, an
 *   empty line or cell, a non-numeric cell, ragged rows, NaN or infinity
 */
export function parseCsvTable(bytes: Uint8Array, field: UploadField): Table {
  const lines = decodeText(bytes, field).split(/\r?\n/);
  while (lines.length > 0 && lines[lines.length - 1].trim() === "") lines.pop();
  const rows: { line: number; text: string }[] = [];
  lines.forEach((text, k) => {
    if (!text.trimStart().startsWith("#")) rows.push({ line: k + 1, text });
  });
  if (rows.length === 0) throw uploadProblem(field, "the file is empty");
  const split = splitterFor(rows[0].text);
  const first = split(rows[0].text);
  if (looksLikeHeader(first)) {
    throw uploadProblem(field, `row 1 looks like a header (${first.slice(0, 3).map((c) => JSON.stringify(c)).join(", ")}${first.length > 3 ? ", …" : ""}); remove it — the file must hold numbers only`);
  }
  const cols = first.length;
  const data = new Float64Array(rows.length * cols);
  rows.forEach((row, r) => {
    const label = row.line === r + 1 ? `row ${r + 1}` : `row ${r + 1} (line ${row.line})`;
    if (row.text.trim() === "") throw uploadProblem(field, `${label} is empty`);
    const cells = r === 0 ? first : split(row.text);
    if (cells.length !== cols) throw uploadProblem(field, `${label} has ${cells.length} values, but row 1 has ${cols} (ragged rows)`);
    cells.forEach((c, j) => {
      data[r * cols + j] = token(c, `${label}, column ${j + 1}`, field);
    });
  });
  return assertFiniteTable({ rows: rows.length, cols, data }, field);
}

/**
 * Reads a square coupling matrix from CSV (see parseCsvTable).
 * @returns { n, data } row-major
 * @throws InvalidError as parseCsvTable, or when the table is not square
 */
export function parseCsvMatrix(bytes: Uint8Array): SquareMatrix {
  return squareOf(parseCsvTable(bytes, "matrix"));
}
