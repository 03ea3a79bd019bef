/**
 * Writes a float64 array in the NumPy .npy format, version 1.0 (NumPy Enhancement Proposal 1,
 * "A simple file format for NumPy arrays"): the magic string \x93NUMPY, version bytes 1 0, a
 * little-endian uint16 header length, an ASCII dict header padded with spaces and ended by
 * '\n' so the data starts at a multiple of 64 bytes (as numpy ≥ 1.24 writes it), then the data
 * little-endian ('<f8'), C order.
 * @param data values in C (row-major) order
 * @param shape dimensions; their product must equal data.length
 * @returns the file's bytes
 * @throws RangeError when shape and data disagree or a dimension is not a non-negative integer
 */
export function writeNpy(data: Float64Array, shape: readonly number[]): Uint8Array {
  let size = 1;
  for (const d of shape) {
    if (!Number.isSafeInteger(d) || d < 0) throw new RangeError(`shape entries must be non-negative integers, got ${d}`);
    size *= d;
  }
  if (size !== data.length) throw new RangeError(`shape ${JSON.stringify(shape)} holds ${size} values, data has ${data.length}`);
  const dims = shape.length === 1 ? `(${shape[0]},)` : `(${shape.join(", ")})`;
  const dict = `{'descr': '<f8', 'fortran_order': False, 'shape': ${dims}, }`;
  const preamble = 10;
  const padded = Math.ceil((preamble + dict.length + 1) / 64) * 64;
  const header = dict + " ".repeat(padded - preamble - dict.length - 1) + "\n";
  const out = new Uint8Array(padded + 8 * size);
  out.set([0x93, 0x4e, 0x55, 0x4d, 0x50, 0x59, 1, 0], 0);
  const view = new DataView(out.buffer);
  view.setUint16(8, header.length, true);
  for (let k = 0; k < header.length; k++) out[preamble + k] = header.charCodeAt(k);
  for (let k = 0; k < size; k++) view.setFloat64(padded + 8 * k, data[k], true);
  return out;
}
