import { describe, expect, it } from "vitest";
import { writeNpy } from "../../../../server/engine/io/npy-write";
import { parseNpy } from "../../../../server/engine/io/npy";
import ref from "../../../reference/npy-2x3.json";

describe("writeNpy", () => {
  it("writes the same bytes as numpy.save (tests/reference/npy-2x3.json, numpy 2.4.6)", () => {
    const data = Float64Array.from(ref.matrix.flat());
    const bytes = writeNpy(data, [2, 3]);
    expect(Buffer.from(bytes).toString("base64")).toBe(ref.base64);
  });

  it("round-trips through the engine's reader for a vector and a matrix", () => {
    const v = Float64Array.from([0.1, -3, 7e12]);
    const back = parseNpy(writeNpy(v, [3]));
    expect(back.shape).toEqual([3]);
    expect(Array.from(back.data)).toEqual(Array.from(v));
  });

  it("refuses a shape that does not hold the data", () => {
    expect(() => writeNpy(new Float64Array(5), [2, 3])).toThrow(RangeError);
    expect(() => writeNpy(new Float64Array(0), [-1])).toThrow(/non-negative/);
  });
});
