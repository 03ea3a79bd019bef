import type { Network } from "../ensembles/ensemble";
import type { BatchRhs, OdeSystem } from "./types";
import { pairKernelModule } from "./pair-kernel-wasm";

/** The shape of a rate network dx/dt = −μx + J φ(x) + I (ensembles/rate/rate-network.ts). */
interface RateLike extends Network {
  readonly couplings: Float64Array;
  readonly input: Float64Array;
  readonly nonlinearity: { readonly id?: string; apply(x: Float64Array, out: Float64Array): void };
}

function isRateLike(net: Network): net is RateLike {
  const r = net as Partial<RateLike>;
  return (
    r.couplings instanceof Float64Array &&
    r.couplings.length === net.n * net.n &&
    r.input instanceof Float64Array &&
    r.input.length === net.n &&
    typeof r.nonlinearity?.apply === "function"
  );
}

/**
 * The network as a system for the batched Dormand–Prince driver: its own `rhsBatch` when it has
 * one; for a rate network a batched kernel that evaluates −μx + Jφ(x) + I for two or four states per
 * pass over J (each coupling row is read once for both, halving memory traffic; ideas of
 * science.md §4) — in WebAssembly SIMD, one f64x2 lane per state (pair-kernel-wasm.ts), or in
 * plain JavaScript where SIMD is unavailable — with the same four-way accumulation order per
 * state as the network's own rhs, so every row equals rhs bit for bit (tested); otherwise the
 * network unchanged (rows are evaluated one by one).
 * @param network the network
 * @param options simd: use the WebAssembly kernel where available (default true)
 * @returns an OdeSystem, possibly with rhsBatch
 */
export function batchedSystem(network: Network, options: { simd?: boolean } = {}): OdeSystem & Partial<BatchRhs> {
  const own = network as Network & Partial<BatchRhs>;
  if (typeof own.rhsBatch === "function") return own;
  if (!isRateLike(network)) return network;
  return new RateBatch(network, options.simd ?? true);
}

class RateBatch implements OdeSystem, BatchRhs {
  readonly n: number;
  private phi = new Float64Array(0);
  private readonly wasm: WasmPair | null;
  private readonly isTanh: boolean;

  constructor(private readonly net: RateLike, simd: boolean) {
    this.n = net.n;
    const mod = simd ? pairKernelModule() : null;
    this.wasm = mod ? new WasmPair(mod, net.couplings, net.n) : null;
    this.isTanh = net.nonlinearity.id === "tanh";
  }

  rhs(x: Float64Array, out: Float64Array): void {
    this.net.rhs(x, out);
  }

  rhsBatch(xs: Float64Array, out: Float64Array, count: number): void {
    const n = this.n;
    if (this.phi.length < count * n) this.phi = new Float64Array(count * n);
    // tanh is written straight into the kernel's interleaved buffer (Math.tanh, as the "tanh"
    // nonlinearity computes it); any other φ goes through its own apply first.
    if (!(this.wasm && this.isTanh)) this.net.nonlinearity.apply(xs.subarray(0, count * n), this.phi.subarray(0, count * n));
    let r = 0;
    if (this.wasm) for (; r + 3 < count; r += 4) this.wasmRows(xs, out, r, 4);
    for (; r + 1 < count; r += 2) {
      if (this.wasm) this.wasmRows(xs, out, r, 2);
      else this.pair(xs, out, r * n, (r + 1) * n);
    }
    if (r < count) {
      if (this.wasm) this.wasmRows(xs, out, r, 2, 1);
      else this.single(xs, out, r * n);
    }
  }

  /**
   * Rows first … first+width−1 (width 2 or 4) through the SIMD kernel; `rows` < width fills the
   * missing lanes with copies of the last row and discards their sums.
   */
  private wasmRows(xs: Float64Array, out: Float64Array, first: number, width: 2 | 4, rows: number = width): void {
    const { n } = this;
    const { input, mu } = this.net;
    const w = this.wasm!;
    const wp = w.p;
    const ws = w.s;
    const p = this.phi;
    const base = first * n;
    for (let q = 0; q < width; q++) {
      const src = base + Math.min(q, rows - 1) * n;
      if (this.isTanh) for (let c = 0; c < n; c++) wp[width * c + q] = Math.tanh(xs[src + c]);
      else for (let c = 0; c < n; c++) wp[width * c + q] = p[src + c];
    }
    w.run(width);
    for (let q = 0; q < rows; q++) {
      const a = base + q * n;
      for (let i = 0; i < n; i++) out[a + i] = -mu * xs[a + i] + ws[width * i + q] + input[i];
    }
  }

  private pair(xs: Float64Array, out: Float64Array, a: number, b: number): void {
    const { n } = this;
    const { couplings: j, input, mu } = this.net;
    const p = this.phi;
    for (let i = 0; i < n; i++) {
      const row = i * n;
      let a0 = 0, a1 = 0, a2 = 0, a3 = 0, b0 = 0, b1 = 0, b2 = 0, b3 = 0;
      let c = 0;
      for (; c + 3 < n; c += 4) {
        const j0 = j[row + c], j1 = j[row + c + 1], j2 = j[row + c + 2], j3 = j[row + c + 3];
        a0 += j0 * p[a + c];
        a1 += j1 * p[a + c + 1];
        a2 += j2 * p[a + c + 2];
        a3 += j3 * p[a + c + 3];
        b0 += j0 * p[b + c];
        b1 += j1 * p[b + c + 1];
        b2 += j2 * p[b + c + 2];
        b3 += j3 * p[b + c + 3];
      }
      for (; c < n; c++) {
        a0 += j[row + c] * p[a + c];
        b0 += j[row + c] * p[b + c];
      }
      out[a + i] = -mu * xs[a + i] + (a0 + a1 + (a2 + a3)) + input[i];
      out[b + i] = -mu * xs[b + i] + (b0 + b1 + (b2 + b3)) + input[i];
    }
  }

  private single(xs: Float64Array, out: Float64Array, a: number): void {
    const { n } = this;
    const { couplings: j, input, mu } = this.net;
    const p = this.phi;
    for (let i = 0; i < n; i++) {
      const row = i * n;
      let s0 = 0, s1 = 0, s2 = 0, s3 = 0;
      let c = 0;
      for (; c + 3 < n; c += 4) {
        s0 += j[row + c] * p[a + c];
        s1 += j[row + c + 1] * p[a + c + 1];
        s2 += j[row + c + 2] * p[a + c + 2];
        s3 += j[row + c + 3] * p[a + c + 3];
      }
      for (; c < n; c++) s0 += j[row + c] * p[a + c];
      out[a + i] = -mu * xs[a + i] + (s0 + s1 + (s2 + s3)) + input[i];
    }
  }
}

/** One instance of the SIMD kernels with its own memory: J, then p (4n), then sums (4n). */
class WasmPair {
  readonly p: Float64Array;
  readonly s: Float64Array;
  private readonly k2: (jOff: number, pOff: number, sOff: number, n: number) => void;
  private readonly k4: (jOff: number, pOff: number, sOff: number, n: number) => void;
  private readonly offsets: [number, number, number, number];

  constructor(mod: WebAssembly.Module, j: Float64Array, n: number) {
    const align = (v: number) => Math.ceil(v / 16) * 16;
    const pOff = align(8 * n * n);
    const sOff = align(pOff + 32 * n);
    const bytes = sOff + 32 * n;
    const memory = new WebAssembly.Memory({ initial: Math.ceil(bytes / 65536) });
    const instance = new WebAssembly.Instance(mod, { e: { m: memory } });
    this.k2 = instance.exports.k2 as WasmPair["k2"];
    this.k4 = instance.exports.k4 as WasmPair["k4"];
    new Float64Array(memory.buffer, 0, n * n).set(j);
    this.p = new Float64Array(memory.buffer, pOff, 4 * n);
    this.s = new Float64Array(memory.buffer, sOff, 4 * n);
    this.offsets = [0, pOff, sOff, n];
  }

  run(width: 2 | 4): void {
    if (width === 4) this.k4(...this.offsets);
    else this.k2(...this.offsets);
  }
}
