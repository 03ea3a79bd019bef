import { describe, expect, it } from "vitest";
import { batchedSystem } from "../../../../server/engine/integrate/batched-system";
import { rateNetworkFromMatrix } from "../../../../server/engine/ensembles/rate/rate-network";
import { createRng } from "../../../../server/engine/random/rng";

describe("batchedSystem", () => {
  it.each([true, false])("evaluates each row of a rate network exactly as its own rhs does (bit for bit; SIMD %s)", (simd) => {
    for (const n of [1, 5, 13, 64]) {
      const rng = createRng(42, n);
      const j = new Float64Array(n * n);
      rng.fillNormal(j);
      const input = new Float64Array(n);
      rng.fillNormal(input);
      const net = rateNetworkFromMatrix(j, 0.7, input);
      const sys = batchedSystem(net, { simd });
      expect(typeof sys.rhsBatch).toBe("function");
      const count = 7; // 4 + 2 + 1: exercises the four-, two- and one-state kernels
      const xs = new Float64Array(count * n);
      rng.fillNormal(xs);
      const out = new Float64Array(count * n);
      sys.rhsBatch!(xs, out, count);
      for (let r = 0; r < count; r++) {
        const alone = new Float64Array(n);
        net.rhs(xs.subarray(r * n, (r + 1) * n), alone);
        expect(Array.from(out.subarray(r * n, (r + 1) * n))).toEqual(Array.from(alone));
      }
    }
  });

  it("leaves a network without a coupling matrix unchanged", () => {
    const plain = { n: 1, mu: 1, rhsFlops: 1, stateScale: 1, rhs: () => {}, jacobian: () => {} };
    expect(batchedSystem(plain)).toBe(plain);
  });
});
