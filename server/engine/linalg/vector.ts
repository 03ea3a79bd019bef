/** Small vector kernels on Float64Array used throughout the engine (common practice). */

/** Infinity norm max_i |x_i| of x[offset … offset+n). NaN entries make the result NaN. */
export function normInf(x: Float64Array, offset = 0, n = x.length - offset): number {
  let m = 0;
  for (let i = offset; i < offset + n; i++) {
    const v = Math.abs(x[i]);
    if (v > m || v !== v) m = v;
  }
  return m;
}

/** Euclidean norm of x. */
export function norm2(x: Float64Array): number {
  let s = 0;
  for (let i = 0; i < x.length; i++) s += x[i] * x[i];
  return Math.sqrt(s);
}

/** Infinity-norm distance ‖x − y‖∞ between x and y[offset … offset+x.length). */
export function distInf(x: Float64Array, y: Float64Array, offset = 0): number {
  let m = 0;
  for (let i = 0; i < x.length; i++) {
    const v = Math.abs(x[i] - y[offset + i]);
    if (v > m || v !== v) m = v;
  }
  return m;
}

/** True when every entry of x is finite. */
export function allFinite(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i])) return false;
  return true;
}
