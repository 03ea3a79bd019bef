import { readFileSync } from "node:fs";
import path from "node:path";
import { describe, expect, it } from "vitest";
import { InvalidError } from "../../../server/lib/errors";
import { readInputUpload, readMatrixUpload } from "../../../server/modules/probes/parse/read-upload";

// Parsing each upload format against matrices written by independent tools (numpy 2.4.6 for
// .npy and .csv, hand-written Matrix Market files read back with scipy 1.17.1 scipy.io.mmread):
// fixtures in tests/fixtures/probes, made by scripts/reference/probe_fixtures.py (see the
// README there). Every bad input must be refused with a message naming the problem.

const FIX = path.resolve(import.meta.dirname, "../../fixtures/probes");
const file = (name: string) => ({ originalname: name, buffer: readFileSync(path.join(FIX, name)) });
const text = (name: string, body: string) => ({ originalname: name, buffer: Buffer.from(body) });
const rowsOf = (name: string): number[][] => JSON.parse(readFileSync(path.join(FIX, name), "utf8")).rows;

function expectRows(data: Float64Array, n: number, rows: number[][]) {
  expect(rows.length).toBe(n);
  rows.forEach((row, i) => row.forEach((v, j) => expect(data[i * n + j]).toBe(v)));
}

function problem(f: () => unknown): string {
  try {
    f();
  } catch (e) {
    expect(e).toBeInstanceOf(InvalidError);
    return (e as InvalidError).message;
  }
  throw new Error("expected an InvalidError");
}

describe("good uploads equal the independently written matrices", () => {
  it.each([
    ["f64-5.npy", "f64-5.json", "npy"], // numpy.save float64, values from the JSON numpy wrote
    ["f32-4.npy", "f32-4.json", "npy"], // numpy.save float32 (widened exactly to float64)
    ["good-4.csv", "good-4.json", "csv"], // numpy.savetxt %.17g round-trips float64 exactly
    ["coordinate-4.mtx", "coordinate-4.json", "mtx"], // scipy.io.mmread of the same file
    ["array-3.mtx", "array-3.json", "mtx"], // column-major array format, scipy.io.mmread
    ["symmetric-3.mtx", "symmetric-3.json", "mtx"], // lower triangle mirrored, scipy.io.mmread
  ])("%s", (name, json, format) => {
    const m = readMatrixUpload(file(name));
    expect(m.format).toBe(format);
    expectRows(m.data, m.n, rowsOf(json));
  });

  it("reads input vectors as a column (CSV) or a 1-D array (.npy)", () => {
    const col = JSON.parse(readFileSync(path.join(FIX, "input-4.json"), "utf8")).values as number[];
    expect(Array.from(readInputUpload(file("input-4.csv"), 4))).toEqual(col);
    const vec = JSON.parse(readFileSync(path.join(FIX, "input-5.json"), "utf8")).values as number[];
    expect(Array.from(readInputUpload(file("input-5.npy"), 5))).toEqual(vec);
    expect(problem(() => readInputUpload(file("input-5.npy"), 4))).toMatch(/expected 4 values .* got 5/);
  });

  it("accepts semicolons, tabs, comments, CRLF and a byte-order mark in CSV", () => {
    const m = readMatrixUpload(text("m.csv", "\uFEFF# my matrix\r\n1;2\r\n3;4\r\n\r\n"));
    expect(Array.from(m.data)).toEqual([1, 2, 3, 4]);
    expect(Array.from(readMatrixUpload(text("t.csv", "1\t-2.5e-1\n.5\t4\n")).data)).toEqual([1, -0.25, 0.5, 4]);
  });
});

describe("bad uploads are refused with the problem named", () => {
  it.each([
    ["ragged.csv", /row 3 has 2 values, but row 1 has 3 \(ragged rows\)/],
    ["non-numeric.csv", /row 2, column 2: "five" is not a number/],
    ["nan.csv", /row 2, column 3 is NaN/],
    ["inf.csv", /row 3, column 1 is minus infinity/],
    ["header.csv", /row 1 looks like a header \("a", "b", "c"\)/],
    ["not-square.csv", /not square: 3 rows × 4 columns/],
    ["empty.csv", /the file is empty/],
    ["complex.npy", /complex dtype '<c16'/],
    ["int.npy", /integer dtype '<i8'/],
    ["fortran.npy", /Fortran order/],
    ["big-endian.npy", /big-endian dtype '>f8'/],
    ["truncated.npy", /truncated: the data holds 193 bytes, the header promises 200/],
    ["wrong-count.mtx", /wrong count: the size line promises 5 entries, the file has 4/],
  ])("%s", (name, message) => {
    expect(problem(() => readMatrixUpload(file(name)))).toMatch(message);
  });

  it("names a wrong extension, or a missing one", () => {
    expect(problem(() => readMatrixUpload(text("couplings.txt", "1,2\n3,4\n")))).toMatch(/"couplings.txt" has extension "\.txt"; use \.csv, \.npy, \.mtx/);
    expect(problem(() => readMatrixUpload(text("couplings", "1")))).toMatch(/has no extension/);
  });

  it("refuses Matrix Market files outside what NISTIR 5935 allows or we support", () => {
    const mm = (body: string) => problem(() => readMatrixUpload(text("m.mtx", body)));
    expect(mm("3 3 1\n1 1 2\n")).toMatch(/missing the "%%MatrixMarket matrix …" banner/);
    expect(mm("%%MatrixMarket matrix coordinate complex general\n2 2 1\n1 1 1 0\n")).toMatch(/complex matrices are not supported/);
    expect(mm("%%MatrixMarket matrix coordinate pattern general\n2 2 1\n1 1\n")).toMatch(/pattern matrix carries no values/);
    expect(mm("%%MatrixMarket matrix coordinate real general\n2 2 1\n3 1 1\n")).toMatch(/entry 1: row 3 is outside 1…2/);
    expect(mm("%%MatrixMarket matrix coordinate real general\n2 2 2\n1 2 1\n1 2 5\n")).toMatch(/entry 2 repeats position \(1, 2\)/);
    expect(mm("%%MatrixMarket matrix coordinate real symmetric\n2 2 1\n1 2 1\n")).toMatch(/above the diagonal/);
    expect(mm("%%MatrixMarket matrix array real general\n2 2\n1\n2\n3\n")).toMatch(/promises 4 entries, the file has 3/);
    expect(mm("%%MatrixMarket matrix array real general\n2 2\n1\n2\nnan\n4\n")).toMatch(/value 3 \(row 1, column 2\): nan is not allowed/);
    expect(mm("%%MatrixMarket matrix coordinate real general\n2 3 1\n1 1 1\n")).toMatch(/not square: 2 rows × 3 columns/);
  });

  it("expands a skew-symmetric array file (strict lower triangle, column-major)", () => {
    const m = readMatrixUpload(text("s.mtx", "%%MatrixMarket matrix array real skew-symmetric\n3 3\n1\n2\n3\n"));
    // Stored: (2,1) = 1, (3,1) = 2, (3,2) = 3; mirrored with a sign change (NISTIR 5935 §3).
    expect(Array.from(m.data)).toEqual([0, -1, -2, 1, 0, -3, 2, 3, 0]);
  });

  it("refuses N above the limit of 2000", () => {
    const n = 2001;
    const body = `%%MatrixMarket matrix coordinate real general\n${n} ${n} 1\n1 1 1\n`;
    expect(problem(() => readMatrixUpload(text("big.mtx", body)))).toMatch(/N = 2001 is over the limit of 2000 units/);
  });
});
