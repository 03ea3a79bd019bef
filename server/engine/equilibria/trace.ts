/** A trajectory trace of a few units, downsampled for display. */
export interface Trace {
  /** Start index within its network. */
  start: number;
  /** Units shown. */
  units: number[];
  /** Times of the points. */
  t: number[];
  /** x[unit][point]. */
  x: number[][];
}

/**
 * Records (t, x_u) for a few units u at every accepted step and downsamples to at most
 * maxPoints points on an even time grid (the last recorded point at or before each grid time).
 */
export class TraceRecorder {
  private readonly ts: number[] = [0];
  private readonly xs: number[][];

  constructor(readonly start: number, readonly units: number[], x0: Float64Array, private readonly maxPoints = 100) {
    if (!Number.isSafeInteger(maxPoints) || maxPoints < 2) {
      throw new RangeError(`maxPoints must be an integer ≥ 2, got ${maxPoints}`);
    }
    this.xs = units.map((u) => [x0[u]]);
  }

  record(t: number, x: Float64Array): void {
    this.ts.push(t);
    for (let k = 0; k < this.units.length; k++) this.xs[k].push(x[this.units[k]]);
  }

  /** The downsampled trace. */
  finish(): Trace {
    const tEnd = this.ts[this.ts.length - 1];
    const picks: number[] = [];
    let j = 0;
    for (let p = 0; p < this.maxPoints - 1; p++) {
      const target = (tEnd * p) / (this.maxPoints - 1);
      while (j + 1 < this.ts.length && this.ts[j + 1] <= target) j++;
      if (picks.length === 0 || picks[picks.length - 1] !== j) picks.push(j);
    }
    if (picks[picks.length - 1] !== this.ts.length - 1) picks.push(this.ts.length - 1);
    return {
      start: this.start,
      units: [...this.units],
      t: picks.map((i) => this.ts[i]),
      x: this.xs.map((row) => picks.map((i) => row[i])),
    };
  }
}
