import { sql } from "drizzle-orm";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { mapComparisonSchema } from "../../../shared/schemas/review";
import { createComputePool, type ComputePool } from "../../../server/jobs/compute-pool";
import { startJobWorkers, type JobWorkers } from "../../../server/jobs/job-workers";
import { mapFinishedMailHook } from "../../../server/jobs/map-finished.job";
import { logger } from "../../../server/lib/logger";
import { startFakeSmtp, type FakeSmtp } from "../../../server/mail/fake-smtp";
import { createMailer, type Mailer } from "../../../server/mail/mailer";
import { insertOutboxMessage } from "../../../server/mail/outbox.repo";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { type TestClient } from "../../helpers/http-client";
import { waitFor } from "../jobs/map-fixture";
import { fillCache, rateBody } from "../maps/maps-fixtures";

// Replication through the real queue and an in-process worker (thread pool of 2): a seed change
// at a budget of 24 networks agrees cell by cell, a changed gain g does not; and the "map
// finished" e-mail reaches the SMTP fake's outbox for owners who opted in, with a working link.

let app: TestApp;
let smtp: FakeSmtp;
let mailer: Mailer;
let compute: ComputePool;
let workers: JobWorkers;

beforeAll(async () => {
  app = await startTestApp({ queue: true });
  smtp = await startFakeSmtp({ port: 0, onMessage: (m) => insertOutboxMessage(app.database.db, m) });
  mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "Equilibrist <no-reply@equilibrist.test>" });
  compute = createComputePool({ threads: 2 });
  workers = await startJobWorkers({
    db: app.database.db, boss: app.boss!, compute, workerName: "review-test:1", logger, pollingIntervalSeconds: 0.5,
    onMapFinished: mapFinishedMailHook({ db: app.database.db, mailer, appUrl: app.baseUrl, logger }),
  });
});

afterAll(async () => {
  await workers?.stop();
  await app?.stop(); // stops pg-boss, then closes the database
  await compute?.close();
  mailer?.close();
  await smtp?.close();
});

const budget = { networks: 24, starts: 8, tMax: 100 };

async function waitDone(client: TestClient, id: string) {
  return waitFor(async () => {
    const m = await client.get(`/api/maps/${id}`);
    if (m.body.status === "failed") throw new Error(`map failed: ${m.body.failure}`);
    return m.body.status === "done" ? m.body : undefined;
  }, 120_000, `map ${id} done`);
}

async function finishedJobs(mapId: string): Promise<number> {
  const r = await app.database.db.execute<{ n: number }>(sql`select count(*)::int as n from pgboss.job where name = 'map-finished' and data->>'mapId' = ${mapId} and state = 'completed'`);
  return r.rows[0].n;
}

describe("replication of a small map", () => {
  it("a new seed agrees cell by cell; a different g disagrees; the opted-in owner is e-mailed", async () => {
    const owner = await signedInPerson(app, "replicator");
    await owner.client.patch("/api/account/preferences", { notifyMapFinished: true });
    const a = await owner.client.post("/api/maps", rateBody({ title: "Gain one", budget }));
    expect(a.status).toBe(201);
    const replicate = await owner.client.post(`/api/maps/${a.body.id}/replicate`, { seed: 2 });
    const otherGain = await owner.client.post("/api/maps", rateBody({ title: "Gain three", budget, settings: { N: 6, g: 3, nonlinearity: "tanh", input: 0 } }));
    for (const m of [a, replicate, otherGain]) await waitDone(owner.client, m.body.id);

    const same = mapComparisonSchema.parse((await owner.client.get(`/api/maps/${a.body.id}/compare/${replicate.body.id}`)).body);
    expect(same.summary.differingSettings).toEqual(["seed"]);
    expect(same.summary.tested).toBe(9);
    // Under the null each cell agrees with probability ≈ 0.95: "most cells" = at least 8 of 9.
    expect(same.summary.agreeing).toBeGreaterThanOrEqual(8);

    const differ = mapComparisonSchema.parse((await owner.client.get(`/api/maps/${a.body.id}/compare/${otherGain.body.id}`)).body);
    expect(differ.summary.differingSettings).toEqual(["settings.g"]);
    expect(differ.summary.agreeShare!).toBeLessThanOrEqual(0.5);
    expect(differ.summary.agreeUpper!).toBeLessThan(0.95); // significantly below the null's 95 %

    const mail = await waitFor(async () => (await app.lastMailTo(owner.email)) ?? undefined, 30_000, "map-finished e-mail");
    expect(mail.subject).toMatch(/^Map finished: /);
    const link = /(http:\/\/127\.0\.0\.1:\d+\/maps\/([0-9a-f-]{36}))/.exec(mail.text);
    expect(link).not.toBeNull();
    expect(link![1].startsWith(app.baseUrl)).toBe(true);
    expect([a.body.id, replicate.body.id, otherGain.body.id]).toContain(link![2]);
    expect(mail.text).toMatch(/9 cells \(9 computed, 0 from the cache\)/);
    expect((await owner.client.get(`/api/maps/${link![2]}`)).status).toBe(200);
  });
});

describe("map finished e-mail", () => {
  it("arrives for a cached map of an opted-in owner, and never for owners who did not opt in", async () => {
    const spec = rateBody({ title: "Cached for mail", budget: { networks: 3, starts: 4, tMax: 100 }, seed: 31 });
    await fillCache(app.database.db, { ensemble: "rate", settings: spec.settings, mu: spec.mu, tau: spec.tau, budget: spec.budget, seed: spec.seed } as never);
    const quiet = await signedInPerson(app, "quiet");
    const q = await quiet.client.post("/api/maps", spec);
    expect(q.body.status).toBe("done");
    const keen = await signedInPerson(app, "keen");
    await keen.client.patch("/api/account/preferences", { notifyMapFinished: true });
    const k = await keen.client.post("/api/maps", spec);
    const mail = await waitFor(async () => (await app.lastMailTo(keen.email)) ?? undefined, 30_000, "e-mail to the keen owner");
    expect(mail.subject).toBe("Map finished: Cached for mail");
    expect(mail.text).toContain(`${app.baseUrl}/maps/${k.body.id}`);
    expect(mail.text).toMatch(/9 cells \(0 computed, 9 from the cache\)/);
    await waitFor(async () => ((await finishedJobs(q.body.id)) === 1 ? true : undefined), 30_000, "quiet map's map-finished job");
    expect(await app.lastMailTo(quiet.email)).toBeUndefined();
  });
});
