import { describe, expect, it } from "vitest";
import {
  MAP_KAC_RICE, canonicalJson, cellInputFor, cellKey, mapSpecFromRow, theoryKey, theoryPayloadFor, type MapSpec,
} from "../../../server/modules/maps/cell-key";

const spec: MapSpec = {
  ensemble: "rate",
  settings: { N: 6, g: 1 },
  mu: { min: 0.5, max: 2, steps: 3 },
  tau: { min: 0, max: 1, steps: 3 },
  budget: { networks: 4, starts: 8 },
  seed: 1,
};

describe("canonicalJson", () => {
  it("sorts keys at every depth, drops undefined, keeps array order", () => {
    expect(canonicalJson({ b: 1, a: [{ d: 2, c: null }, 3], e: "x", u: undefined })).toBe('{"a":[{"c":null,"d":2},3],"b":1,"e":"x"}');
    expect(canonicalJson(-0)).toBe("0");
  });

  it("refuses values JSON cannot carry", () => {
    expect(() => canonicalJson({ x: Number.NaN })).toThrow(RangeError);
    expect(() => canonicalJson({ x: Infinity })).toThrow(RangeError);
    expect(() => canonicalJson({ f: () => 1 })).toThrow(TypeError);
  });
});

describe("cellInputFor and cellKey", () => {
  it("fills defaults, indexes μ by i and τ by j", () => {
    expect(cellInputFor(spec, 1, 2)).toEqual({
      ensemble: "rate",
      params: { N: 6, g: 1, nonlinearity: "tanh", input: 0 },
      mu: 1.25,
      tau: 1,
      budget: { networks: 4, starts: 8, tMax: 200, rtol: 1e-6, atol: 1e-9, exhaustive: false },
      seed: 1,
    });
  });

  it("hashes the canonical JSON with sha256", () => {
    // Pinned: sha256 of
    // {"budget":{"atol":1e-9,"exhaustive":false,"networks":4,"rtol":0.000001,"starts":8,"tMax":200},"engineVersion":"dynamics-3","ensemble":"rate","ensembleVersion":"1","mu":1.25,"params":{"N":6,"g":1,"input":0,"nonlinearity":"tanh"},"seed":1,"tau":1}
    // computed with Python 3.11 hashlib.sha256. A change here changes every stored key (the
    // cache is then cold): bump ENGINE_VERSION or the ensemble version on purpose and re-pin.
    expect(cellKey(cellInputFor(spec, 1, 2))).toBe("7cc9d09f63fcf3ef394140b6ddceb310f8f9a077f4cabcc68277011518bd1ba3");
  });

  it("gives one key however the manifest spells the same cell", () => {
    const spelled: MapSpec = {
      ...spec,
      settings: { input: 0, nonlinearity: "tanh", g: 1, N: 6 },
      budget: { starts: 8, networks: 4, tMax: 200, exhaustive: false },
      mu: { min: 0.5, max: 2, steps: 3, scale: "linear" },
    };
    expect(cellKey(cellInputFor(spelled, 2, 0))).toBe(cellKey(cellInputFor(spec, 2, 0)));
  });

  it("changes with every field that determines the result", () => {
    const base = cellKey(cellInputFor(spec, 1, 1));
    const variants: MapSpec[] = [
      { ...spec, seed: 2 },
      { ...spec, settings: { N: 7, g: 1 } },
      { ...spec, settings: { N: 6, g: 1, input: 0.1 } },
      { ...spec, budget: { networks: 4, starts: 9 } },
      { ...spec, budget: { networks: 4, starts: 8, rtol: 1e-7 } },
      { ...spec, mu: { min: 0.5, max: 2.5, steps: 3 } },
      { ...spec, tau: { min: 0, max: 0.9, steps: 3 } },
    ];
    const keys = new Set(variants.map((v) => cellKey(cellInputFor(v, 1, 1))));
    expect(keys.size).toBe(variants.length);
    expect(keys.has(base)).toBe(false);
  });

  it("refuses positions off the grid and parameters the ensemble refuses", () => {
    expect(() => cellInputFor(spec, 3, 0)).toThrow(/i must be an integer in \[0, 2\]/);
    expect(() => cellInputFor(spec, 0, -1)).toThrow(RangeError);
    expect(() => cellInputFor({ ...spec, ensemble: "nope" }, 0, 0)).toThrow(/ensemble must be one of/);
    expect(() => cellInputFor({ ...spec, settings: { N: 6, g: -1 } }, 0, 0)).toThrow(RangeError);
  });

  it("reads a stored map row the same way", () => {
    const row = { ensemble: "rate", settings: spec.settings, muAxis: spec.mu, tauAxis: spec.tau, budget: spec.budget, seed: 1 };
    expect(cellKey(cellInputFor(mapSpecFromRow(row), 2, 2))).toBe(cellKey(cellInputFor(spec, 2, 2)));
  });
});

describe("theory rows", () => {
  it("field rows carry the fixed Kac–Rice settings, rate rows none", () => {
    const field = theoryPayloadFor({ ...spec, ensemble: "field", settings: { N: 4, sigma: 2 } }, 0);
    expect(field).toMatchObject({ ensemble: "field", params: { N: 4, sigma: 2 }, tau: 0, mus: [0.5, 1.25, 2], kacRice: MAP_KAC_RICE });
    const rate = theoryPayloadFor(spec, 2);
    expect(rate).toMatchObject({ ensemble: "rate", params: { N: 6, g: 1 }, tau: 1, mus: [0.5, 1.25, 2] });
    expect(rate.kacRice).toBeUndefined();
  });

  it("shares a row between maps that differ only in what theory does not read", () => {
    const a = theoryPayloadFor(spec, 1);
    const b = theoryPayloadFor({ ...spec, seed: 99, budget: { networks: 2, starts: 2 }, settings: { N: 6, g: 1, input: 0.5 } }, 1);
    expect(b.theoryKey).toBe(a.theoryKey);
    expect(theoryPayloadFor({ ...spec, settings: { N: 6, g: 1.2 } }, 1).theoryKey).not.toBe(a.theoryKey);
    const { theoryKey: key, ...body } = a;
    expect(theoryKey(body)).toBe(key);
  });
});
