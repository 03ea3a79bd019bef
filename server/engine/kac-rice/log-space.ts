/**
 * Streaming log-sum-exp: accumulates ln Σ e^{v_i} without overflow (the running maximum is
 * factored out; Blanchard, Higham & Higham, IMA J. Numer. Anal. 41 (2021) 2311).
 */
export class LogSum {
  private max = -Infinity;
  private scaled = 0;

  /** Adds e^v to the sum; v = −∞ adds nothing. */
  add(v: number): void {
    if (v === -Infinity) return;
    if (Number.isNaN(v)) throw new RangeError("LogSum.add: value is NaN");
    if (v <= this.max) {
      this.scaled += Math.exp(v - this.max);
    } else {
      this.scaled = this.scaled * Math.exp(this.max - v) + 1;
      this.max = v;
    }
  }

  /** ln of the sum so far (−∞ when empty or all terms were zero). */
  value(): number {
    return this.max === -Infinity ? -Infinity : this.max + Math.log(this.scaled);
  }
}

/**
 * ln Σ_i e^{v_i} over an array (log-sum-exp with the maximum factored out).
 * @param values logs of the terms (−∞ allowed)
 * @returns ln of the sum, −∞ for an empty array or all −∞
 * @throws RangeError when a value is NaN
 */
export function logSumExp(values: ArrayLike<number>): number {
  const acc = new LogSum();
  for (let i = 0; i < values.length; i++) acc.add(values[i]);
  return acc.value();
}
