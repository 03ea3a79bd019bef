import { readFileSync } from "node:fs";
import { parseNpy, type NpyArray } from "../io/npy";
import { CliError } from "./args";

function fromJson(text: string, path: string): NpyArray {
  let v: unknown;
  try {
    v = JSON.parse(text);
  } catch {
    throw new CliError(`${path}: not valid JSON`);
  }
  if (!Array.isArray(v) || v.length === 0) throw new CliError(`${path}: expected a non-empty JSON array`);
  if (v.every((e) => typeof e === "number")) return { shape: [v.length], data: Float64Array.from(v as number[]) };
  if (!v.every((r) => Array.isArray(r))) throw new CliError(`${path}: expected an array of numbers or of rows`);
  const cols = (v[0] as unknown[]).length;
  const data = new Float64Array(v.length * cols);
  (v as unknown[][]).forEach((row, i) => {
    if (row.length !== cols) throw new CliError(`${path}: row ${i} has ${row.length} entries, expected ${cols}`);
    row.forEach((e, j) => {
      if (typeof e !== "number") throw new CliError(`${path}: entry [${i}][${j}] is not a number`);
      data[i * cols + j] = e;
    });
  });
  return { shape: [v.length, cols], data };
}

/**
 * Loads a 1-D or 2-D real array from a .npy file (io/npy.ts) or a JSON array (of numbers, or
 * of equal-length rows); checks every entry is finite.
 * @throws CliError with a one-line reason (missing file, bad format, non-finite entries)
 */
export function loadArray(path: string): NpyArray {
  let bytes: Buffer;
  try {
    bytes = readFileSync(path);
  } catch {
    throw new CliError(`cannot read ${path}`);
  }
  let arr: NpyArray;
  if (path.toLowerCase().endsWith(".json")) arr = fromJson(bytes.toString("utf8"), path);
  else {
    try {
      arr = parseNpy(new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength));
    } catch (e) {
      throw new CliError(`${path}: ${(e as Error).message}`);
    }
  }
  const bad = arr.data.findIndex((v) => !Number.isFinite(v));
  if (bad >= 0) throw new CliError(`${path}: entry ${bad} is not finite`);
  return arr;
}
