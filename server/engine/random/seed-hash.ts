/**
 * Seed hashing for the random streams: turns a tuple of integers (base seed, stream indices…)
 * into a 128-bit generator state. Mixing follows SplitMix64 (G. L. Steele, D. Lea & C. H.
 * Flood, "Fast splittable pseudorandom number generators", OOPSLA 2014; finaliser constants of
 * S. Vigna's splitmix64.c), applied to each integer in turn with the position and the tuple
 * length folded in, so (7), (7, 0) and (0, 7) give unrelated states.
 */

const MASK64 = (1n << 64n) - 1n;
const GOLDEN = 0x9e3779b97f4a7c15n;

/** SplitMix64 finaliser: a bijective avalanche of a 64-bit word. */
function mix64(z: bigint): bigint {
  z = ((z ^ (z >> 30n)) * 0xbf58476d1ce4e5b9n) & MASK64;
  z = ((z ^ (z >> 27n)) * 0x94d049bb133111ebn) & MASK64;
  return z ^ (z >> 31n);
}

/**
 * Hashes a tuple of safe integers into four signed 32-bit words (a 128-bit state).
 * Algorithm: z₀ = constant; z_{i+1} = mix64(z_i ⊕ mix64(v_i + (i+1)·φ64)); the length is folded
 * in last; the two state halves are mix64(z + φ64) and mix64(z + 2φ64) (SplitMix64 outputs).
 * @param values integers in [−2⁵³, 2⁵³] (negative values use their 64-bit two's complement)
 * @returns [hi0, lo0, hi1, lo1] as signed 32-bit integers, never all zero
 * @throws TypeError when a value is not a safe integer
 */
export function hashSeedTuple(values: readonly number[]): [number, number, number, number] {
  let z = 0x243f6a8885a308d3n;
  values.forEach((v, i) => {
    if (!Number.isSafeInteger(v)) {
      throw new TypeError(`seed/stream value #${i} must be a safe integer, got ${v}`);
    }
    const word = BigInt.asUintN(64, BigInt(v));
    z = mix64(z ^ mix64((word + BigInt(i + 1) * GOLDEN) & MASK64));
  });
  z = mix64(z ^ BigInt(values.length));
  const s0 = mix64((z + GOLDEN) & MASK64);
  let s1 = mix64((z + 2n * GOLDEN) & MASK64);
  if (s0 === 0n && s1 === 0n) s1 = GOLDEN; // xoroshiro forbids the all-zero state
  const word32 = (x: bigint) => Number(BigInt.asIntN(32, x));
  return [word32(s0 >> 32n), word32(s0), word32(s1 >> 32n), word32(s1)];
}

/**
 * 32-bit FNV-1a hash of a string's UTF-16 code units (Fowler–Noll–Vo, IETF draft
 * draft-eastlake-fnv). Used to turn an ensemble id into a stream index.
 * @param text the string to hash
 * @returns an unsigned 32-bit integer
 */
export function hashString32(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h >>> 0;
}
