/**
 * The storage form of matrices and vectors in the probes table: little-endian float64,
 * row-major (server/db/schema/probes.ts), independent of the machine's byte order.
 */
export function toBytes(values: Float64Array): Buffer {
  const buf = Buffer.alloc(values.length * 8);
  for (let k = 0; k < values.length; k++) buf.writeDoubleLE(values[k], 8 * k);
  return buf;
}

/**
 * Reads stored little-endian float64 bytes back.
 * @throws RangeError when the byte count is not a multiple of 8
 */
export function fromBytes(bytes: Buffer, into?: Float64Array): Float64Array {
  if (bytes.length % 8 !== 0) throw new RangeError(`stored bytes must be a multiple of 8, got ${bytes.length}`);
  const out = into ?? new Float64Array(bytes.length / 8);
  for (let k = 0; k < out.length; k++) out[k] = bytes.readDoubleLE(8 * k);
  return out;
}
