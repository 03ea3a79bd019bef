/**
 * WebAssembly SIMD kernels for the rate network's batched right-hand side: for two (or four)
 * states stored interleaved (p[2c + s] = φ(x_s)_c) they write, for every row i of J, the sums
 * Σ_c J_ic p_s,c of each state s, one f64x2 lane per state (each coupling is loaded once for all
 * the states). The sums use four
 * accumulators over c ≡ 0, 1, 2, 3 (mod 4), the tail added to the first, combined as
 * (s0 + s1) + (s2 + s3): the same IEEE operations in the same order as the scalar kernel of
 * ensembles/rate/rate-network.ts, so results agree bit for bit (f64x2.mul/add are exactly the
 * scalar operations per lane; WebAssembly SIMD has no fused multiply-add). The module is
 * encoded here byte by byte (WebAssembly Core Specification 2.0, binary format §5; fixed-width
 * SIMD opcodes §5.4.8).
 */

const I32 = 0x7f;
const V128 = 0x7b;

function uleb(v: number): number[] {
  const out: number[] = [];
  do {
    let b = v & 0x7f;
    v >>>= 7;
    if (v !== 0) b |= 0x80;
    out.push(b);
  } while (v !== 0);
  return out;
}

function section(id: number, body: number[]): number[] {
  return [id, ...uleb(body.length), ...body];
}

const str = (s: string) => [...uleb(s.length), ...Array.from(s, (ch) => ch.charCodeAt(0))];

// Locals: 0 jOff, 1 pOff, 2 sOff, 3 n (params); 4 i, 5 c, 6 row, 7 n4, 8 ja, 9 pa (i32);
// 10 the splatted coupling (v128); 11 … accumulators acc[h][k] = 11 + 4h + k (v128).
const [J_OFF, P_OFF, S_OFF, N, I, C, ROW, N4, JA, PA, JV] = [0, 1, 2, 3, 4, 5, 6, 7, 8, 9, 10];
const acc = (h: number, k: number) => 11 + 4 * h + k;
const get = (l: number) => [0x20, l];
const set = (l: number) => [0x21, l];
const i32c = (v: number) => [0x41, ...sleb(v)];
const SIMD = (op: number) => [0xfd, ...uleb(op)];
const F64X2_SPLAT = SIMD(0x14);
const F64X2_ADD = SIMD(0xf0);
const F64X2_MUL = SIMD(0xf2);
const f64Load = (offset: number) => [0x2b, 3, ...uleb(offset)];
const v128Load = (offset: number) => [...SIMD(0x00), 4, ...uleb(offset)];
const V128_ZERO = [...SIMD(0x0c), ...new Array<number>(16).fill(0)];

function sleb(v: number): number[] {
  const out: number[] = [];
  for (;;) {
    const b = v & 0x7f;
    v >>= 7;
    if ((v === 0 && (b & 0x40) === 0) || (v === -1 && (b & 0x40) !== 0)) {
      out.push(b);
      return out;
    }
    out.push(b | 0x80);
  }
}

/** `for (; c < limit; c += step) body` as block/loop. */
function loopWhileLess(limit: number, step: number, body: number[]): number[] {
  return [0x02, 0x40, 0x03, 0x40, ...get(C), ...get(limit), 0x4e, 0x0d, 1, ...body,
    ...get(C), ...i32c(step), 0x6a, ...set(C), 0x0c, 0, 0x0b, 0x0b];
}

/** acc[h]_k += splat(J[row + c + k]) · p[c + k][h], for each v128 half h of the states. */
function macc(k: number, halves: number): number[] {
  const code = [...get(JA), ...f64Load(8 * k), ...F64X2_SPLAT, ...set(JV)];
  for (let h = 0; h < halves; h++) {
    code.push(...get(acc(h, k)), ...get(JV), ...get(PA), ...v128Load(16 * (halves * k + h)), ...F64X2_MUL, ...F64X2_ADD, ...set(acc(h, k)));
  }
  return code;
}

/** ja = row + 8c; pa = pOff + 16·halves·c. */
const addresses = (halves: number) => [
  ...get(ROW), ...get(C), ...i32c(3), 0x74, 0x6a, ...set(JA),
  ...get(P_OFF), ...get(C), ...i32c(halves === 1 ? 4 : 5), 0x74, 0x6a, ...set(PA),
];

/** s[i][h] = (acc[h]_0 + acc[h]_1) + (acc[h]_2 + acc[h]_3). */
function storeSums(halves: number): number[] {
  const code: number[] = [];
  for (let h = 0; h < halves; h++) {
    code.push(...get(S_OFF), ...get(I), ...i32c(halves === 1 ? 4 : 5), 0x74, 0x6a);
    code.push(...get(acc(h, 0)), ...get(acc(h, 1)), ...F64X2_ADD, ...get(acc(h, 2)), ...get(acc(h, 3)), ...F64X2_ADD, ...F64X2_ADD);
    code.push(...SIMD(0x0b), 4, ...uleb(16 * h));
  }
  return code;
}

function rowBody(halves: number): number[] {
  const accs = Array.from({ length: 4 * halves }, (_, a) => 11 + a);
  return [
    ...accs.flatMap((a) => [...V128_ZERO, ...set(a)]),
    ...get(I), ...get(N), 0x6c, ...i32c(3), 0x74, ...get(J_OFF), 0x6a, ...set(ROW),
    ...i32c(0), ...set(C),
    ...loopWhileLess(N4, 4, [...addresses(halves), ...[0, 1, 2, 3].flatMap((k) => macc(k, halves))]),
    ...loopWhileLess(N, 1, [...addresses(halves), ...macc(0, halves)]),
    ...storeSums(halves),
  ];
}

function functionBody(halves: number): number[] {
  const code = [
    ...get(N), ...i32c(-4), 0x71, ...set(N4),
    ...i32c(0), ...set(I),
    0x02, 0x40, 0x03, 0x40, ...get(I), ...get(N), 0x4e, 0x0d, 1,
    ...rowBody(halves),
    ...get(I), ...i32c(1), 0x6a, ...set(I), 0x0c, 0, 0x0b, 0x0b,
    0x0b,
  ];
  const locals = [2, 6, I32, 1 + 4 * halves, V128];
  return [...uleb(locals.length + code.length), ...locals, ...code];
}

/**
 * The encoded module: imports memory e.m and exports k2(jOff, pOff, sOff, n) for two states
 * (p and s interleaved by 2) and k4(…) for four states (interleaved by 4, two v128 per coupling).
 */
export function pairKernelBytes(): Uint8Array<ArrayBuffer> {
  const bytes = [
    0x00, 0x61, 0x73, 0x6d, 0x01, 0x00, 0x00, 0x00,
    ...section(1, [1, 0x60, 4, I32, I32, I32, I32, 0]),
    ...section(2, [1, ...str("e"), ...str("m"), 0x02, 0x00, 1]),
    ...section(3, [2, 0, 0]),
    ...section(7, [2, ...str("k2"), 0x00, 0, ...str("k4"), 0x00, 1]),
    ...section(10, [2, ...functionBody(1), ...functionBody(2)]),
  ];
  return Uint8Array.from(bytes);
}

let compiled: WebAssembly.Module | null | undefined;

/** The compiled module, or null where WebAssembly SIMD is unavailable (callers fall back to JS). */
export function pairKernelModule(): WebAssembly.Module | null {
  if (compiled !== undefined) return compiled;
  const bytes = pairKernelBytes();
  compiled = typeof WebAssembly === "object" && WebAssembly.validate(bytes) ? new WebAssembly.Module(bytes) : null;
  return compiled;
}
