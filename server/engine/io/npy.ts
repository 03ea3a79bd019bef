/**
 * Reader of NumPy .npy files (format versions 1.0, 2.0 and 3.0, as specified in numpy's
 * `numpy.lib.format` documentation, "A simple file format for NumPy arrays", NEP 1): magic
 * "\x93NUMPY", version bytes, a little-endian header length (2 bytes in v1, 4 in v2/v3), an
 * ASCII/UTF-8 Python dict literal with 'descr', 'fortran_order' and 'shape', then the raw data.
 * Pure: works on bytes, no file access.
 */

/** A real array read from a .npy file, in C (row-major) order. */
export interface NpyArray {
  /** Shape: [n] or [rows, cols]. */
  shape: number[];
  /** Values converted to float64, row-major. */
  data: Float64Array;
}

const MAGIC = [0x93, 0x4e, 0x55, 0x4d, 0x50, 0x59]; // \x93NUMPY

function fail(why: string): never {
  throw new TypeError(`not a supported .npy file: ${why}`);
}

function parseHeader(text: string): { descr: string; fortran: boolean; shape: number[] } {
  const descr = /'descr'\s*:\s*'([^']*)'/.exec(text)?.[1];
  const fortran = /'fortran_order'\s*:\s*(True|False)/.exec(text)?.[1];
  const shapeText = /'shape'\s*:\s*\(([^)]*)\)/.exec(text)?.[1];
  if (descr === undefined || fortran === undefined || shapeText === undefined) fail("malformed header");
  const shape = shapeText
    .split(",")
    .map((s) => s.trim())
    .filter((s) => s.length > 0)
    .map((s) => (/^\d+$/.test(s) ? Number(s) : fail(`bad shape entry ${JSON.stringify(s)}`)));
  return { descr, fortran: fortran === "True", shape };
}

const KIND_NAMES: Record<string, string> = {
  c: "complex", i: "integer", u: "unsigned integer", b: "boolean", O: "object", U: "string", S: "bytes", M: "datetime", m: "timedelta", V: "structured",
};

/**
 * Accepts '<f8' and '<f4' only; names what else the dtype is (complex, integer, big-endian…).
 * @throws TypeError naming the dtype's kind or byte order
 */
function checkDtype(descr: string): void {
  if (descr === "<f8" || descr === "<f4") return;
  const m = /^([<>|=]?)([a-zA-Z])(\d*)$/.exec(descr);
  const kind = m ? KIND_NAMES[m[2]] : undefined;
  if (kind) fail(`${kind} dtype '${descr}' (only real float64 '<f8' or float32 '<f4')`);
  if (m && m[2] === "f" && m[1] === ">") fail(`big-endian dtype '${descr}' (save a little-endian copy: arr.astype('<f${m[3]}'))`);
  fail(`dtype '${descr}' (only little-endian float64 '<f8' or float32 '<f4')`);
}

/**
 * Parses a .npy file holding a 1-D or 2-D little-endian float64 ('<f8') or float32 ('<f4')
 * array in C order.
 * @param bytes the whole file
 * @returns shape and data as float64
 * @throws TypeError with a one-line reason for anything else (bad magic, version, dtype — named
 *   as complex, integer, big-endian… —, Fortran order, rank other than 1 or 2, truncated data)
 */
export function parseNpy(bytes: Uint8Array): NpyArray {
  if (bytes.length < 10 || MAGIC.some((b, i) => bytes[i] !== b)) fail("missing \\x93NUMPY magic");
  const major = bytes[6];
  if (major < 1 || major > 3) fail(`format version ${major}.${bytes[7]} is not 1.x, 2.x or 3.x`);
  const view = new DataView(bytes.buffer, bytes.byteOffset, bytes.byteLength);
  const headerLen = major === 1 ? view.getUint16(8, true) : view.getUint32(8, true);
  const start = major === 1 ? 10 : 12;
  if (start + headerLen > bytes.length) fail("header runs past the end of the file");
  const header = parseHeader(new TextDecoder(major === 3 ? "utf-8" : "latin1").decode(bytes.subarray(start, start + headerLen)));
  checkDtype(header.descr);
  if (header.fortran) fail("Fortran order (save a C-ordered array: numpy.ascontiguousarray)");
  if (header.shape.length < 1 || header.shape.length > 2) fail(`rank ${header.shape.length} (only 1-D or 2-D)`);
  const count = header.shape.reduce((a, b) => a * b, 1);
  const width = header.descr === "<f8" ? 8 : 4;
  const offset = start + headerLen;
  if (bytes.length - offset < count * width) fail(`truncated: the data holds ${bytes.length - offset} bytes, the header promises ${count * width}`);
  const data = new Float64Array(count);
  for (let i = 0; i < count; i++) {
    data[i] = width === 8 ? view.getFloat64(offset + 8 * i, true) : view.getFloat32(offset + 4 * i, true);
  }
  return { shape: header.shape, data };
}
