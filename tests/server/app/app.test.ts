import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { openDatabase } from "../../../server/db/client";
import { startTestApp, signedInPerson, type TestApp } from "../../helpers/test-app";

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  await app?.stop();
});

describe("health", () => {
  it("answers { ok: true } when the database answers", async () => {
    const res = await app.client().get("/api/health");
    expect(res.status).toBe(200);
    expect(res.body).toEqual({ ok: true });
  });
});

describe("unknown routes and bodies", () => {
  it("answers 404 JSON for an unknown /api route, any method", async () => {
    const c = app.client();
    for (const res of [await c.get("/api/nope"), await c.post("/api/auth/nope", {}), await c.delete("/api")]) {
      expect(res.status).toBe(404);
      expect(res.headers.get("content-type")).toMatch(/application\/json/);
      expect(res.body.error.code).toBe("NOT_FOUND");
    }
  });

  it("answers 413 for a JSON body over the 1 MB limit", async () => {
    const raw = JSON.stringify({ email: "a@b.example", password: "x".repeat(1_100_000), name: "Big" });
    const res = await app.client().post("/api/auth/register", undefined, { raw });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe("PAYLOAD_TOO_LARGE");
  });

  it("answers 400 for malformed JSON", async () => {
    const res = await app.client().post("/api/auth/login", undefined, { raw: '{"email": ' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe("BAD_REQUEST");
  });
});

describe("security headers and cross-site requests", () => {
  it("sets helmet's headers", async () => {
    const res = await app.client().get("/api/health");
    expect(res.headers.get("x-content-type-options")).toBe("nosniff");
    expect(res.headers.get("content-security-policy")).toContain("default-src 'self'");
    expect(res.headers.get("x-powered-by")).toBeNull();
  });

  it("refuses a state-changing request whose Origin names another site", async () => {
    const res = await app.client().post("/api/groups", { name: "x" }, { headers: { origin: "http://evil.example" } });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe("FORBIDDEN");
    const nullOrigin = await app.client().post("/api/auth/logout", undefined, { headers: { origin: "null" } });
    expect(nullOrigin.status).toBe(403);
  });

  it("lets same-origin and Origin-less (script) requests through", async () => {
    const person = await signedInPerson(app, "origin");
    const same = await person.client.post("/api/groups", { name: "Same origin" }, { headers: { origin: app.baseUrl } });
    expect(same.status).toBe(201);
    const script = await person.client.post("/api/groups", { name: "No origin" });
    expect(script.status).toBe(201);
  });

  it("does not check Origin on GET", async () => {
    const res = await app.client().get("/api/health", { headers: { origin: "http://evil.example" } });
    expect(res.status).toBe(200);
  });
});

describe("failures inside the server", () => {
  it("answers 500 without a stack trace, and health 503, when the database is gone", async () => {
    const broken = openDatabase(app.database.pool.options.connectionString as string, { max: 1 });
    await app.bootWith(broken);
    const person = await signedInPerson(app, "broken");
    await broken.close();
    const res = await person.client.get("/api/auth/me");
    expect(res.status).toBe(500);
    expect(res.body).toEqual({ error: { code: "INTERNAL", message: expect.any(String) } });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.(ts|js)|Error:|pool/i);
    const health = await app.client().get("/api/health");
    expect(health.status).toBe(503);
    expect(health.body.error.code).toBe("UNAVAILABLE");
    await app.restart();
  });
});

describe("restarting the app", () => {
  it("keeps accounts, sessions and groups", async () => {
    const person = await signedInPerson(app, "restart");
    const created = await person.client.post("/api/groups", { name: "Survives restarts" });
    expect(created.status).toBe(201);
    await app.restart();
    // The same cookie jar, pointed at the new server, still has a valid session.
    const again = app.client();
    for (const [k, v] of person.client.jar) again.jar.set(k, v);
    const me = await again.get("/api/auth/me");
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(person.email);
    const groups = await again.get("/api/groups");
    expect(groups.body.items.map((g: { name: string }) => g.name)).toContain("Survives restarts");
    const login = await app.client().post("/api/auth/login", { email: person.email, password: person.password });
    expect(login.status).toBe(200);
  });
});
