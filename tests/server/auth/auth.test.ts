import { eq, sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { passwordResetTokens, users } from "../../../server/db/schema/index";
import { pruneRateLimits } from "../../../server/modules/auth/rate-limit.repo";
import { SESSION_COOKIE } from "../../../server/modules/auth/session";
import { newPerson, signedInPerson, startTestApp, tokenFromMail, type TestApp } from "../../helpers/test-app";

let app: TestApp;
beforeAll(async () => {
  app = await startTestApp();
});
afterAll(async () => {
  await app?.stop();
});

describe("POST /api/auth/register", () => {
  it("creates the account, signs it in (201) and stores an argon2id hash", async () => {
    const person = newPerson("reg");
    const c = app.client();
    const res = await c.post("/api/auth/register", { ...person, email: `  ${person.email.toUpperCase()} ` });
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({ email: person.email, name: person.name, siteRole: "member" });
    expect(res.body).not.toHaveProperty("passwordHash");
    const cookie = res.headers.getSetCookie().find((l) => l.startsWith(`${SESSION_COOKIE}=`));
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    expect((await c.get("/api/auth/me")).body.email).toBe(person.email);
    const [row] = await app.database.db.select().from(users).where(eq(users.email, person.email));
    expect(row.passwordHash).toMatch(/^\$argon2id\$/); // PHC string format of argon2id (common practice)
  });

  it("answers 409 on a duplicate e-mail", async () => {
    const person = await signedInPerson(app, "dup");
    const res = await app.client().post("/api/auth/register", { ...newPerson("dup2"), email: person.email });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe("CONFLICT");
    expect(res.body.error.issues).toEqual([{ path: "email", message: expect.any(String) }]);
  });

  it("answers 422 with field issues", async () => {
    const res = await app.client().post("/api/auth/register", { email: "nope", password: "short", name: "" });
    expect(res.status).toBe(422);
    expect(res.body.error.code).toBe("VALIDATION");
    expect(res.body.error.issues.map((i: { path: string }) => i.path).sort((a: string, b: string) => a.localeCompare(b))).toEqual([
      "email",
      "name",
      "password",
    ]);
  });

  it("regenerates the session id when registering", async () => {
    const c = app.client();
    const first = await signedInPerson(app, "fix");
    for (const [k, v] of first.client.jar) c.jar.set(k, v);
    const before = c.cookie(SESSION_COOKIE);
    expect((await c.post("/api/auth/register", newPerson("fix2"))).status).toBe(201);
    expect(c.cookie(SESSION_COOKIE)).toBeDefined();
    expect(c.cookie(SESSION_COOKIE)).not.toBe(before);
  });
});

describe("POST /api/auth/login and session", () => {
  it("signs in with a new session id and the old one stops working", async () => {
    const person = await signedInPerson(app, "login");
    const c = app.client();
    const anonymous = app.client();
    // A session that existed before sign-in (here: an earlier sign-in of the same person).
    for (const [k, v] of person.client.jar) c.jar.set(k, v);
    for (const [k, v] of person.client.jar) anonymous.jar.set(k, v);
    const before = c.cookie(SESSION_COOKIE);
    const res = await c.post("/api/auth/login", { email: person.email, password: person.password });
    expect(res.status).toBe(200);
    expect(res.body.email).toBe(person.email);
    expect(c.cookie(SESSION_COOKIE)).not.toBe(before);
    expect((await anonymous.get("/api/auth/me")).status).toBe(401);
    expect((await c.get("/api/auth/me")).status).toBe(200);
  });

  it("answers 401 with the same message for a wrong password and an unknown account", async () => {
    const person = await signedInPerson(app, "wrong");
    const wrong = await app.client().post("/api/auth/login", { email: person.email, password: "not the password" });
    const unknown = await app.client().post("/api/auth/login", { email: "nobody@lab.example", password: "whatever123" });
    expect(wrong.status).toBe(401);
    expect(unknown.status).toBe(401);
    expect(wrong.body).toEqual(unknown.body);
    expect(wrong.body.error.code).toBe("UNAUTHENTICATED");
  });

  it("answers 422 for a malformed sign-in", async () => {
    const res = await app.client().post("/api/auth/login", { email: "x", password: "" });
    expect(res.status).toBe(422);
    expect(res.body.error.issues.length).toBe(2);
  });

  it("GET /api/auth/me answers 401 signed out", async () => {
    const res = await app.client().get("/api/auth/me");
    expect(res.status).toBe(401);
    expect(res.body.error.code).toBe("UNAUTHENTICATED");
  });

  it("POST /api/auth/logout ends the session (204) and the cookie no longer works", async () => {
    const person = await signedInPerson(app, "logout");
    const copy = app.client();
    for (const [k, v] of person.client.jar) copy.jar.set(k, v);
    expect((await person.client.post("/api/auth/logout")).status).toBe(204);
    expect((await person.client.get("/api/auth/me")).status).toBe(401);
    expect((await copy.get("/api/auth/me")).status).toBe(401);
  });
});

describe("sign-in rate limits", () => {
  it("limits attempts per account, then per address", async () => {
    const limited = await startTestApp({
      config: { authLimits: { loginPerAccount: { max: 3, windowMs: 60_000 }, loginPerAddress: { max: 6, windowMs: 60_000 } } },
    });
    try {
      const person = await signedInPerson(limited, "limit");
      const attempt = (email: string, password = "wrong password") => limited.client().post("/api/auth/login", { email, password });
      for (let i = 0; i < 3; i++) expect((await attempt(person.email)).status).toBe(401);
      const blocked = await attempt(person.email, person.password);
      expect(blocked.status).toBe(429);
      expect(blocked.body.error.code).toBe("RATE_LIMITED");
      expect(Number(blocked.headers.get("retry-after"))).toBeGreaterThan(0);
      // Other accounts from the same address still get through until the address limit (6).
      expect((await attempt("other1@lab.example")).status).toBe(401);
      expect((await attempt("other2@lab.example")).status).toBe(401);
      expect((await attempt("other3@lab.example")).status).toBe(429);
      // Counters whose window ended are pruned; live ones stay.
      await limited.database.db.execute(sql`update rate_limits set reset_at = now() - interval '1 second' where key like 'login:account:%'`);
      expect(await pruneRateLimits(limited.database.db)).toBe(3); // the account keys of person, other1, other2 (other3 was refused by the address limit first)
      expect((await attempt(person.email, person.password)).status).toBe(429); // the address limit still holds
    } finally {
      await limited.stop();
    }
  });
});

describe("password reset", () => {
  it("answers the same whether or not the account exists", async () => {
    const person = await signedInPerson(app, "forgot");
    const known = await app.client().post("/api/auth/forgot", { email: person.email });
    const unknown = await app.client().post("/api/auth/forgot", { email: "ghost@lab.example" });
    expect(known.status).toBe(202);
    expect(unknown.status).toBe(202);
    expect(known.body).toEqual(unknown.body);
    expect(await app.lastMailTo("ghost@lab.example")).toBeUndefined();
    expect((await app.client().post("/api/auth/forgot", { email: "bad" })).status).toBe(422);
  });

  it("e-mails a single-use link that sets a new password and signs out everywhere", async () => {
    const person = await signedInPerson(app, "reset");
    await app.client().post("/api/auth/forgot", { email: person.email });
    const mail = await app.lastMailTo(person.email);
    expect(mail.subject).toMatch(/reset/i);
    expect(mail.text).toContain(`${app.baseUrl}/reset?token=`);
    const token = tokenFromMail(mail.text, "reset");
    const [stored] = await app.database.db.select().from(passwordResetTokens);
    expect(stored.tokenHash).not.toContain(token);
    const fresh = "a brand new password";
    const res = await app.client().post("/api/auth/reset", { token, password: fresh });
    expect(res.status).toBe(200);
    expect((await person.client.get("/api/auth/me")).status).toBe(401);
    expect((await app.client().post("/api/auth/login", { email: person.email, password: fresh })).status).toBe(200);
    expect((await app.client().post("/api/auth/login", { email: person.email, password: person.password })).status).toBe(401);
    const again = await app.client().post("/api/auth/reset", { token, password: "yet another password" });
    expect(again.status).toBe(422);
    expect(again.body.error.issues[0].path).toBe("token");
  });

  it("refuses an expired token (the row's expiry moved into the past)", async () => {
    const person = await signedInPerson(app, "expire");
    await app.client().post("/api/auth/forgot", { email: person.email });
    const token = tokenFromMail((await app.lastMailTo(person.email)).text, "reset");
    await app.database.db
      .update(passwordResetTokens)
      .set({ expiresAt: new Date(Date.now() - 1000) })
      .where(eq(passwordResetTokens.userId, person.id));
    const res = await app.client().post("/api/auth/reset", { token, password: "too late password" });
    expect(res.status).toBe(422);
    expect((await app.client().post("/api/auth/login", { email: person.email, password: person.password })).status).toBe(200);
  });

  it("answers 422 for a malformed reset and for an unknown token", async () => {
    expect((await app.client().post("/api/auth/reset", { token: "x", password: "short" })).status).toBe(422);
    const unknown = await app.client().post("/api/auth/reset", { token: "A".repeat(43), password: "long enough password" });
    expect(unknown.status).toBe(422);
  });

  it("stores new tokens with a one-hour expiry", async () => {
    const person = await signedInPerson(app, "ttl");
    const t0 = Date.now();
    await app.client().post("/api/auth/forgot", { email: person.email });
    const [row] = await app.database.db.select().from(passwordResetTokens).where(eq(passwordResetTokens.userId, person.id));
    expect(row.expiresAt.getTime() - t0).toBeGreaterThan(59 * 60_000);
    expect(row.expiresAt.getTime() - t0).toBeLessThanOrEqual(60 * 60_000 + 5_000);
  });
});
