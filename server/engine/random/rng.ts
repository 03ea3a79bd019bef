import { xoroshiro128plusFromState } from "pure-rand/generator/xoroshiro128plus";
import type { JumpableRandomGenerator } from "pure-rand/types/JumpableRandomGenerator";
import { hashSeedTuple, hashString32 } from "./seed-hash";

/** A seeded stream of random numbers. Mutable: every call advances the stream. */
export interface Rng {
  /** Uniform on [0, 1), a multiple of 2⁻⁵³. */
  uniform(): number;
  /** Standard normal N(0, 1). */
  normal(): number;
  /** Fills `out` with independent standard normals (same values as repeated `normal()`). */
  fillNormal(out: Float64Array): void;
  /** Fills `out` with independent uniforms on [0, 1). */
  fillUniform(out: Float64Array): void;
  /** Uniform integer in {0, …, bound − 1}, bound a positive safe integer. */
  uniformInt(bound: number): number;
}

const TWO_POW_26 = 67108864;
const TWO_POW_M53 = 1.1102230246251565e-16;

class XoroshiroRng implements Rng {
  private spare = 0;
  private hasSpare = false;

  constructor(private readonly gen: JumpableRandomGenerator) {}

  uniform(): number {
    // pure-rand's next() returns the low 32 bits of the xoroshiro128+ sum; its lowest bits are
    // weak (Blackman & Vigna 2018, §10), so we keep the upper 27 and 26 bits of two outputs.
    const a = this.gen.next() >>> 5;
    const b = this.gen.next() >>> 6;
    return (a * TWO_POW_26 + b) * TWO_POW_M53;
  }

  normal(): number {
    if (this.hasSpare) {
      this.hasSpare = false;
      return this.spare;
    }
    let u = 0;
    let v = 0;
    let s = 0;
    do {
      u = 2 * this.uniform() - 1;
      v = 2 * this.uniform() - 1;
      s = u * u + v * v;
    } while (s >= 1 || s === 0);
    const factor = Math.sqrt((-2 * Math.log(s)) / s);
    this.spare = v * factor;
    this.hasSpare = true;
    return u * factor;
  }

  fillNormal(out: Float64Array): void {
    for (let i = 0; i < out.length; i++) out[i] = this.normal();
  }

  fillUniform(out: Float64Array): void {
    for (let i = 0; i < out.length; i++) out[i] = this.uniform();
  }

  uniformInt(bound: number): number {
    if (!Number.isSafeInteger(bound) || bound < 1) {
      throw new RangeError(`bound must be a positive safe integer, got ${bound}`);
    }
    return Math.floor(this.uniform() * bound);
  }
}

/**
 * Creates a seeded random stream: the xoroshiro128+ generator of pure-rand (D. Blackman &
 * S. Vigna, "Scrambled linear pseudorandom number generators", 2018) started from a 128-bit
 * state that is the SplitMix64 hash of (seed, ...stream) (see seed-hash.ts), so distinct tuples
 * give statistically independent streams. Uniforms use the upper bits of each output;
 * normals use the Marsaglia polar method (G. Marsaglia & T. A. Bray, "A convenient method for
 * generating normal variables", SIAM Review 6 (1964) 260), which is exact.
 * @param seed base seed, a safe integer
 * @param stream further safe integers that select an independent substream
 * @returns a mutable Rng
 * @throws TypeError when seed or a stream index is not a safe integer
 */
export function createRng(seed: number, ...stream: number[]): Rng {
  if (!Number.isSafeInteger(seed)) {
    throw new TypeError(`seed must be a safe integer, got ${seed}`);
  }
  return new XoroshiroRng(xoroshiro128plusFromState(hashSeedTuple([seed, ...stream])));
}

/**
 * The random stream of network k: the common-random-numbers rule made explicit. The stream
 * depends only on (ensemble id, base seed, k, N) — never on μ, τ or any scale — so network k is
 * the same draw reweighted at every cell of a (μ, τ) grid. Optional substream indices give
 * further independent streams of the same network (e.g. 1 for its random starts); the
 * ensemble's own draws use none.
 * @param ensembleId stable ensemble identifier ("rate", "field", …)
 * @param seed base seed of the map, a safe integer
 * @param k network index, a non-negative safe integer
 * @param n dimension N, a positive safe integer
 * @param substream optional further stream indices
 * @returns a fresh Rng
 * @throws TypeError / RangeError naming the bad argument
 */
export function networkStream(
  ensembleId: string,
  seed: number,
  k: number,
  n: number,
  ...substream: number[]
): Rng {
  if (typeof ensembleId !== "string" || ensembleId.length === 0) {
    throw new TypeError(`ensembleId must be a non-empty string, got ${String(ensembleId)}`);
  }
  if (!Number.isSafeInteger(k) || k < 0) {
    throw new RangeError(`k must be a non-negative safe integer, got ${k}`);
  }
  if (!Number.isSafeInteger(n) || n < 1) {
    throw new RangeError(`N must be a positive safe integer, got ${n}`);
  }
  return createRng(seed, hashString32(ensembleId), k, n, ...substream);
}
