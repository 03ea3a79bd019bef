import { readFileSync } from "node:fs";
import { describe, expect, it } from "vitest";
import { parseNpy } from "../../../../server/engine/io/npy";

const FIX = "tests/fixtures/engine-cli"; // written by numpy 2.4.6 (scripts/reference/make_cli_fixture.py)

describe("parseNpy", () => {
  it("reads numpy's float64 and float32 files with their shapes", () => {
    const j = parseNpy(readFileSync(`${FIX}/J.npy`));
    expect(j.shape).toEqual([8, 8]);
    // J is symmetric by construction: J = g (G + Gᵀ)/√(2N)
    for (let a = 0; a < 8; a++) for (let b = 0; b < 8; b++) expect(j.data[a * 8 + b]).toBe(j.data[b * 8 + a]);
    const x64 = parseNpy(readFileSync(`${FIX}/X0.npy`));
    const x32 = parseNpy(readFileSync(`${FIX}/X0_f4.npy`));
    expect(x32.shape).toEqual([12, 8]);
    x64.data.forEach((v, i) => expect(x32.data[i]).toBeCloseTo(v, 5));
    expect(parseNpy(readFileSync(`${FIX}/I.npy`)).shape).toEqual([8]);
  });

  it("builds a version-1 file by hand and reads it back", () => {
    const header = "{'descr': '<f8', 'fortran_order': False, 'shape': (3,), }";
    const padded = header.padEnd(118, " ") + "\n"; // 10 + 118 + 1 + … keeps data 16-aligned (format spec)
    const bytes = new Uint8Array(10 + padded.length + 24);
    bytes.set([0x93, 0x4e, 0x55, 0x4d, 0x50, 0x59, 1, 0, padded.length & 255, padded.length >> 8]);
    bytes.set(new TextEncoder().encode(padded), 10);
    new DataView(bytes.buffer).setFloat64(10 + padded.length, 1.5, true);
    new DataView(bytes.buffer).setFloat64(10 + padded.length + 8, -2, true);
    new DataView(bytes.buffer).setFloat64(10 + padded.length + 16, 1e-300, true);
    expect(Array.from(parseNpy(bytes).data)).toEqual([1.5, -2, 1e-300]);
    expect(() => parseNpy(bytes.subarray(0, bytes.length - 8))).toThrow(/truncated/);
    expect(() => parseNpy(new Uint8Array([1, 2, 3]))).toThrow(/magic/);
  });
});
