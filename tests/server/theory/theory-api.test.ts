import { afterAll, beforeAll, describe, expect, it } from "vitest";
import {
  boundaryResponseSchema,
  fieldTheoryResponseSchema,
  rateTheoryResponseSchema,
} from "../../../shared/schemas/theory";
import { startTestApp, type TestApp } from "../../helpers/test-app";

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  await app?.stop();
});

describe("GET /api/theory/field", () => {
  it("answers the asymptotic and finite-N values without sign-in (N = 2 against science.md §1)", async () => {
    const mu = 0.5 * Math.SQRT2; // m = 0.5, σ = 1
    const res = await app.client().get(`/api/theory/field?N=2&mu=${mu}&tau=0.5&samples=200`);
    expect(res.status).toBe(200);
    const body = fieldTheoryResponseSchema.parse(res.body);
    expect(body.m).toBeCloseTo(0.5, 12);
    expect(body.muC).toBeCloseTo(Math.SQRT2, 12);
    expect(body.sigmaTotal).toBeCloseTo(0.3181471805599453, 12); // FK 2016 closed form at m = 0.5
    expect(body.regime).toBe("stable-rare"); // m_st(0.5) = 0.316197 < 0.5 (science.md §1)
    expect(body.finiteN.exactTotal).toBeCloseTo(3.63752, 5); // science.md §1 table, N = 2, τ = 0.5
    const total = body.finiteN.total;
    expect(Math.abs((total.mean as number) - 3.63752)).toBeLessThan(4 * (total.se as number));
    expect(body.finiteN.samples).toBe(200);
    expect(body.labels.asymptotic).toMatch(/asymptotic/);
  });

  it("is cached and deterministic: the same query (any key order) gives the same answer", async () => {
    const c = app.client();
    const a = await c.get("/api/theory/field?N=5&mu=1.1&tau=0.3&sigma=0.7&samples=16&seed=4");
    const b = await c.get("/api/theory/field?seed=4&samples=16&sigma=0.7&tau=0.3&mu=1.1&N=5");
    expect(a.status).toBe(200);
    expect(b.body).toEqual(a.body);
    expect(a.body.finiteN.seed).toBe(4);
  });

  it("computes off the web thread: health answers while a large field request runs", async () => {
    const c = app.client();
    const order: string[] = [];
    const heavy = c.get("/api/theory/field?N=150&mu=4&tau=0.6&samples=24").then((r) => {
      order.push("field");
      return r;
    });
    await new Promise((resolve) => setTimeout(resolve, 50));
    const health = await c.get("/api/health");
    order.push("health");
    expect(health.status).toBe(200);
    const res = await heavy;
    expect(res.status).toBe(200);
    expect(order).toEqual(["health", "field"]);
    expect(res.body.finiteN.exactTotal).toBeNull(); // N > 30: Monte Carlo only
  });

  it("answers 422 with field issues on bad input", async () => {
    const c = app.client();
    const cases: [string, string][] = [
      ["N=2.5&mu=1&tau=0.5", "N"],
      ["N=0&mu=1&tau=0.5", "N"],
      ["N=3&mu=0&tau=0.5", "mu"],
      ["N=3&mu=-1&tau=0.5", "mu"],
      ["N=3&mu=1&tau=1.5", "tau"],
      ["N=3&mu=1&tau=-0.1", "tau"],
      ["N=3&mu=abc&tau=0.5", "mu"],
      ["mu=1&tau=0.5", "N"],
      ["N=3&mu=1&tau=0.5&sigma=0", "sigma"],
      ["N=201&mu=1&tau=0.5", "N"],
      ["N=200&mu=1&tau=0.5&samples=64", "samples"],
    ];
    for (const [query, field] of cases) {
      const res = await c.get(`/api/theory/field?${query}`);
      expect(res.status, query).toBe(422);
      expect(res.body.error.code).toBe("VALIDATION");
      expect(res.body.error.issues.map((i: { path: string }) => i.path)).toContain(field);
    }
  });
});

describe("GET /api/theory/rate", () => {
  it("answers μ_c = g, the origin line g(1+τ) and the labelled chaos line", async () => {
    const res = await app.client().get("/api/theory/rate?N=100&mu=1.2&tau=0.5&g=1");
    expect(res.status).toBe(200);
    const body = rateTheoryResponseSchema.parse(res.body);
    expect(body.originStabilityMu).toBeCloseTo(1.5, 14); // μ = g(1+τ), Sommers et al. 1988
    expect(body.originStable).toBe(false);
    expect(body.m).toBeCloseTo(1.2, 14);
    expect(body.ellipse).toEqual({ real: 1.5, imag: 0.5 });
    expect(body.lines[1].status).toBe("recalled-unconfirmed");
    expect(body.lines[1].label).toContain("Martí, Brunel & Ostojic");
  });

  it("answers 422 on a missing g or τ outside [0, 1]", async () => {
    const c = app.client();
    expect((await c.get("/api/theory/rate?N=100&mu=1&tau=0.5")).status).toBe(422);
    expect((await c.get("/api/theory/rate?N=100&mu=1&tau=2&g=1")).status).toBe(422);
  });
});

describe("GET /api/theory/boundary", () => {
  it("answers m_st(τ) (science.md §1: τ = 0.5 → 0.316197) and its log", async () => {
    const res = await app.client().get("/api/theory/boundary?tau=0.5");
    expect(res.status).toBe(200);
    const body = boundaryResponseSchema.parse(res.body);
    expect(body.mStable).toBeCloseTo(0.316197, 6);
    expect(body.logMStable).toBeCloseTo(Math.log(0.316197), 5);
    const zero = await app.client().get("/api/theory/boundary?tau=0");
    expect(zero.body).toEqual({ tau: 0, mStable: 0, logMStable: null });
  });

  it("answers 422 on a missing or out-of-range τ", async () => {
    const c = app.client();
    expect((await c.get("/api/theory/boundary")).status).toBe(422);
    expect((await c.get("/api/theory/boundary?tau=1.01")).status).toBe(422);
  });
});
