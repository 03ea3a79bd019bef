import { describe, expect, it } from "vitest";
import { ensembleIds, ensembles, getEnsemble } from "../../../../server/engine/ensembles/registry";
import { createRng } from "../../../../server/engine/random/rng";

const smallParams: Record<string, object> = { rate: { N: 3, g: 1 }, field: { N: 3, features: 30 } };

describe("ensemble registry", () => {
  it("registers the rate and field ensembles under their own ids", () => {
    expect([...ensembleIds]).toEqual(["rate", "field"]);
    for (const id of ensembleIds) expect(getEnsemble(id).id).toBe(id);
    expect(Object.isFrozen(ensembles)).toBe(true);
  });

  it("throws RangeError naming an unknown id", () => {
    expect(() => getEnsemble("spin-glass")).toThrow(/"spin-glass"/);
    expect(() => getEnsemble("toString")).toThrow(RangeError);
  });

  for (const id of ["rate", "field"]) {
    it(`${id}: validate → draw → build gives a network of the stated dimension with finite output`, () => {
      const ens = getEnsemble(id);
      const params = ens.validate(smallParams[id]);
      const n = ens.dimension(params);
      const net = ens.build(params, ens.draw(params, 1, 0), 1.5, 0.5);
      expect(net.n).toBe(n);
      expect(net.mu).toBe(1.5);
      expect(net.stateScale).toBeGreaterThan(0);
      const x = new Float64Array(n);
      createRng(2).fillNormal(x);
      const out = new Float64Array(n);
      const jac = new Float64Array(n * n);
      net.rhs(x, out);
      net.jacobian(x, jac);
      expect([...out, ...jac].every(Number.isFinite)).toBe(true);
      expect(ens.muCritical(params)).toBeGreaterThan(0);
    });
  }
});
