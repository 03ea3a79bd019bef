import { spawnSync } from "node:child_process";
import { mkdtempSync, readFileSync, writeFileSync } from "node:fs";
import { tmpdir } from "node:os";
import { join } from "node:path";
import { describe, expect, it } from "vitest";
import reference from "../../../fixtures/engine-cli/reference.json";
import { parseNpy } from "../../../../server/engine/io/npy";
import { rateNetworkFromMatrix } from "../../../../server/engine/ensembles/rate/rate-network";

// Fixture written by numpy (scripts/reference/make_cli_fixture.py); reference.json holds the
// stable equilibria found by scipy solve_ivp + fsolve from the same starts.
const FIX = "tests/fixtures/engine-cli";
const out = () => join(mkdtempSync(join(tmpdir(), "eqb-cli-")), "result.json");

function engine(...args: string[]) {
  const r = spawnSync(process.execPath, ["--import", "tsx", "server/engine/cli/main.ts", ...args], { encoding: "utf8" });
  return { code: r.status, stderr: r.stderr };
}

describe("engine equilibria (CLI)", () => {
  it("finds verified equilibria of a numpy-written J, matching scipy's stable ones", () => {
    const file = out();
    const r = engine("equilibria", "--couplings", `${FIX}/J.npy`, "--starts", `${FIX}/X0.npy`, "--input", `${FIX}/I.npy`, "--mu", "1", "--out", file);
    expect(r.code).toBe(0);
    const report = JSON.parse(readFileSync(file, "utf8"));
    expect(Object.keys(report).sort()).toEqual(["equilibria", "runs", "wallSeconds"]);
    expect(report.runs.settled + report.runs.unsettled + report.runs.escaped).toBe(12);
    const J = parseNpy(readFileSync(`${FIX}/J.npy`));
    const I = parseNpy(readFileSync(`${FIX}/I.npy`));
    const net = rateNetworkFromMatrix(J.data, 1, I.data);
    const f = new Float64Array(8);
    for (const e of report.equilibria) {
      expect(Object.keys(e).sort()).toEqual(["basinShare", "index", "maxRealPart", "stable", "x"]);
      net.rhs(Float64Array.from(e.x), f);
      expect(Math.max(...Array.from(f, Math.abs))).toBeLessThan(1e-10);
      expect(e.stable).toBe(e.maxRealPart < 0);
    }
    const stable = report.equilibria.filter((e: { stable: boolean }) => e.stable);
    expect(stable.length).toBe(reference.stable.length);
    for (const ref of reference.stable) {
      const match = stable.some((e: { x: number[] }) => e.x.every((v, i) => Math.abs(v - ref[i]) < 1e-8));
      expect(match).toBe(true);
    }
  });

  it("reads JSON starts and float32 .npy starts", () => {
    const dir = mkdtempSync(join(tmpdir(), "eqb-cli-"));
    const X = parseNpy(readFileSync(`${FIX}/X0.npy`));
    const rows = Array.from({ length: 3 }, (_, i) => Array.from(X.data.subarray(i * 8, (i + 1) * 8)));
    writeFileSync(join(dir, "x0.json"), JSON.stringify(rows));
    expect(engine("equilibria", "--couplings", `${FIX}/J.npy`, "--starts", join(dir, "x0.json"), "--mu", "1", "--out", join(dir, "a.json")).code).toBe(0);
    expect(JSON.parse(readFileSync(join(dir, "a.json"), "utf8")).runs.settled).toBe(3);
    expect(engine("equilibria", "--couplings", `${FIX}/J.npy`, "--starts", `${FIX}/X0_f4.npy`, "--mu", "1", "--out", join(dir, "b.json")).code).toBe(0);
  });

  it.each([
    [["equilibria", "--couplings", `${FIX}/J.npy`, "--starts", `${FIX}/X0.npy`, "--out", "x.json"], /--mu/],
    [["equilibria", "--couplings", `${FIX}/J.npy`, "--starts", `${FIX}/X0.npy`, "--mu", "-1", "--out", "x.json"], /--mu must be a positive number/],
    [["equilibria", "--frobnicate", "1"], /unknown option --frobnicate/],
    [["equilibria", "--couplings", `${FIX}/bad_int.npy`, "--starts", `${FIX}/X0.npy`, "--mu", "1", "--out", "x.json"], /integer dtype .<i8./],
    [["equilibria", "--couplings", `${FIX}/bad_fortran.npy`, "--starts", `${FIX}/X0.npy`, "--mu", "1", "--out", "x.json"], /Fortran order/],
    [["equilibria", "--couplings", `${FIX}/bad_3d.npy`, "--starts", `${FIX}/X0.npy`, "--mu", "1", "--out", "x.json"], /rank 3/],
    [["equilibria", "--couplings", `${FIX}/X0.npy`, "--starts", `${FIX}/X0.npy`, "--mu", "1", "--out", "x.json"], /square/],
    [["equilibria", "--couplings", `${FIX}/missing.npy`, "--starts", `${FIX}/X0.npy`, "--mu", "1", "--out", "x.json"], /cannot read/],
    [["explode"], /unknown command/],
  ])("exits 2 with a one-line message on bad use: %j", (args, message) => {
    const r = engine(...(args as string[]));
    expect(r.code).toBe(2);
    expect(r.stderr.trim().split("\n")).toHaveLength(1);
    expect(r.stderr).toMatch(message as RegExp);
  });
});
