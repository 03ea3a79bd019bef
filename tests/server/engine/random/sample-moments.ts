/** Sample mean of `values` with its standard error (sample standard deviation / √n). */
export function meanWithError(values: ArrayLike<number>): { mean: number; se: number } {
  const n = values.length;
  let s = 0;
  for (let i = 0; i < n; i++) s += values[i];
  const mean = s / n;
  let ss = 0;
  for (let i = 0; i < n; i++) ss += (values[i] - mean) ** 2;
  return { mean, se: Math.sqrt(ss / (n - 1) / n) };
}

/** |estimate − expected| in units of its standard error. */
export function zScore(values: ArrayLike<number>, expected: number): number {
  const { mean, se } = meanWithError(values);
  return Math.abs(mean - expected) / se;
}
