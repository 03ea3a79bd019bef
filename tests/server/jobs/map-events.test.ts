import { sql } from "drizzle-orm";
import express from "express";
import http from "node:http";
import type { AddressInfo } from "node:net";
import { afterAll, beforeAll, describe, expect, it } from "vitest";
import { apiPaths } from "../../../shared/schemas/api-paths";
import { createComputePool, type ComputePool } from "../../../server/jobs/compute-pool";
import { startJobWorkers, type JobWorkers } from "../../../server/jobs/job-workers";
import { logger } from "../../../server/lib/logger";
import { notifyMapEvent } from "../../../server/modules/cells/map-notify.repo";
import { createMapEventsHub } from "../../../server/modules/maps/map-events.hub";
import { createMapEventsRouter } from "../../../server/modules/maps/map-events.router";
import { signedInPerson, startTestApp, type TestApp } from "../../helpers/test-app";
import { openSse, type ReceivedEvent } from "./sse-reader";

// Live events through the real app: a map is created over HTTP (its jobs queued by the maps
// service), a subscriber connects to GET /api/maps/:id/events, then an in-process worker fills
// the map and the subscriber sees every cell arrive.

let app: TestApp;
let compute: ComputePool;
let workers: JobWorkers | undefined;

const body = (seed: number) => ({
  title: "Leak sweep",
  ensemble: "rate",
  settings: { N: 6, g: 1, nonlinearity: "tanh", input: 0 },
  mu: { min: 0.5, max: 2, steps: 3, scale: "linear" },
  tau: { min: 0, max: 1, steps: 3 },
  budget: { networks: 2, starts: 4, tMax: 100, rtol: 1e-6, atol: 1e-9 },
  seed,
  visibility: "private",
});

beforeAll(async () => {
  app = await startTestApp({ queue: true });
  compute = createComputePool({ threads: 2 });
});

afterAll(async () => {
  await workers?.stop();
  await workers?.close();
  await compute?.close();
  await app?.stop();
});

function cookieOf(client: ReturnType<TestApp["client"]>): Record<string, string> {
  return { cookie: [...client.jar].map(([k, v]) => `${k}=${v}`).join("; ") };
}

const cellsDone = (events: ReceivedEvent[]) => new Set(events.filter((e) => e.event === "cell" && e.data.state === "done").map((e) => `${e.data.i},${e.data.j}`)).size;

describe("GET /api/maps/:id/events", () => {
  it("streams progress and status on connect, then a cell event per finished cell, to the owner and to a share link", async () => {
    const owner = await signedInPerson(app, "owner");
    const created = await owner.client.post(apiPaths.maps.list, body(31));
    expect(created.status).toBe(201);
    const id = created.body.id as string;
    const shared = await owner.client.post(apiPaths.maps.share(id));
    expect(shared.status).toBe(200);

    const mine = await openSse(`${app.baseUrl}${apiPaths.maps.events(id)}`, cookieOf(owner.client));
    const viaLink = await openSse(`${app.baseUrl}${apiPaths.maps.events(id)}?share=${encodeURIComponent(shared.body.token)}`);
    expect(mine.status).toBe(200);
    expect(mine.contentType).toMatch(/^text\/event-stream/);
    expect(viaLink.status).toBe(200);
    await mine.until((ev) => ev.some((e) => e.event === "status"));
    expect(mine.events.slice(0, 2).map((e) => e.event)).toEqual(["progress", "status"]);
    expect(mine.events[0].data).toMatchObject({ mapId: id, status: "queued", cellsTotal: 9, cellsDone: 0 });

    workers = await startJobWorkers({ db: app.database.db, boss: app.boss!, compute, workerName: "sse-test:1", logger, pollingIntervalSeconds: 0.5 });
    for (const stream of [mine, viaLink]) {
      // Generous: on a loaded machine the pool's first threads take a while to load the engine.
      await stream.until((ev) => cellsDone(ev) === 9 && ev.some((e) => e.event === "status" && e.data.status === "done"), 90_000);
      const cells = stream.events.filter((e) => e.event === "cell" && e.data.state === "done");
      for (const c of cells) {
        expect(c.data.stable.n).toBe(2); // one estimate per network: the budget's 2 networks
        expect(c.data).toMatchObject({ networks: 2, starts: 4, fromCache: false });
      }
      const last = stream.events.filter((e) => e.event === "progress").at(-1)!;
      expect(last.data).toMatchObject({ status: "done", cellsDone: 9, cellsComputed: 9, cellsFromCache: 0, etaSeconds: 0 });
      expect(last.data.throughput).toBeGreaterThan(0);
    }
    // The τ rows' theory arrives as cell events carrying theory columns (rate network: m = μ/g).
    await mine.until((ev) => ev.filter((e) => e.event === "cell" && e.data.theory !== null && e.data.state === "done").length >= 9);
    const withTheory = mine.events.filter((e) => e.event === "cell" && e.data.theory !== null);
    for (const c of withTheory) expect(c.data.theory.m).toBeCloseTo(c.data.mu / 1, 12);
    mine.close();
    viaLink.close();
  }, 150_000);

  it("tells subscribers when the map is cancelled", async () => {
    const owner = await signedInPerson(app, "owner");
    // Cells of about a second each (N = 30, 8 networks × 48 starts): the cancel comes mid-map.
    const slow = { ...body(33), settings: { N: 30, g: 1, nonlinearity: "tanh", input: 0 }, budget: { networks: 8, starts: 48, tMax: 100, rtol: 1e-6, atol: 1e-9 } };
    const created = await owner.client.post(apiPaths.maps.list, slow);
    expect(created.status).toBe(201);
    const id = created.body.id as string;
    const stream = await openSse(`${app.baseUrl}${apiPaths.maps.events(id)}`, cookieOf(owner.client));
    await stream.until((ev) => ev.some((e) => e.event === "status"));
    expect((await owner.client.post(apiPaths.maps.cancel(id))).status).toBe(200);
    await stream.until((ev) => ev.some((e) => e.event === "status" && e.data.status === "cancelled"), 15_000);
    const last = stream.events.filter((e) => e.event === "progress").at(-1)!;
    expect(last.data.status).toBe("cancelled");
    stream.close();
  });

  it("answers 401 signed out without a token, 404 to another account, 422 on a bad id", async () => {
    const owner = await signedInPerson(app, "owner");
    const other = await signedInPerson(app, "other");
    const created = await owner.client.post(apiPaths.maps.list, body(32));
    const id = created.body.id as string;
    const anon = await openSse(`${app.baseUrl}${apiPaths.maps.events(id)}`);
    expect(anon.status).toBe(401);
    const stranger = await openSse(`${app.baseUrl}${apiPaths.maps.events(id)}`, cookieOf(other.client));
    expect(stranger.status).toBe(404);
    const badToken = await openSse(`${app.baseUrl}${apiPaths.maps.events(id)}?share=nope`);
    expect(badToken.status).toBe(404);
    const bad = await openSse(`${app.baseUrl}/api/maps/not-a-uuid/events`, cookieOf(owner.client));
    expect(bad.status).toBe(422);
  });
});

describe("map events router", () => {
  it("sends heartbeat comments and unsubscribes when the client disconnects", async () => {
    const hub = createMapEventsHub({ db: app.database.db, pool: app.database.pool, logger });
    const mini = express();
    mini.use(createMapEventsRouter({ hub, canRead: async () => undefined, heartbeatMs: 50 }));
    const server = http.createServer(mini);
    await new Promise<void>((r) => server.listen(0, "127.0.0.1", r));
    const url = `http://127.0.0.1:${(server.address() as AddressInfo).port}${apiPaths.maps.events("7a1c1c3e-0d3b-4c55-9a55-0c1f7b2b9e10")}`;
    const stream = await openSse(url);
    expect(stream.status).toBe(200);
    await new Promise((r) => setTimeout(r, 300));
    expect(stream.comments.filter((c) => c === "heartbeat").length).toBeGreaterThanOrEqual(2);
    expect(hub.subscribers).toBe(1);
    stream.close();
    const until = Date.now() + 5000;
    while (hub.subscribers > 0 && Date.now() < until) await new Promise((r) => setTimeout(r, 20));
    expect(hub.subscribers).toBe(0);
    server.closeAllConnections();
    await new Promise<void>((r) => server.close(() => r()));
    await hub.close();
  });

  it("reconnects its LISTEN connection after the server drops it and keeps delivering", async () => {
    const owner = await signedInPerson(app, "owner");
    const created = await owner.client.post(apiPaths.maps.list, body(34));
    const id = created.body.id as string;
    const hub = createMapEventsHub({ db: app.database.db, pool: app.database.pool, logger, reconnectMs: 100, resyncMs: 600_000 });
    const got: string[] = [];
    const unsubscribe = await hub.subscribe(id, (e) => got.push(e.type === "status" ? `status:${e.data.status}` : e.type));
    const listeners = sql`select pid from pg_stat_activity where application_name = 'equilibrist-map-events' and datname = current_database()`;
    const before = (await app.database.db.execute<{ pid: number }>(listeners)).rows.map((r) => r.pid);
    expect(before.length).toBeGreaterThanOrEqual(1);
    await app.database.db.execute(sql`select pg_terminate_backend(pid) from pg_stat_activity where pid in ${before}`);
    const until = Date.now() + 10_000;
    for (;;) {
      const now = (await app.database.db.execute<{ pid: number }>(listeners)).rows.map((r) => r.pid);
      if (now.some((pid) => !before.includes(pid))) break;
      if (Date.now() > until) throw new Error("the hub did not reconnect");
      await new Promise((r) => setTimeout(r, 50));
    }
    expect((await owner.client.post(apiPaths.maps.cancel(id))).status).toBe(200);
    await notifyMapEvent(app.database.db, { mapId: id, status: "cancelled" });
    const deadline = Date.now() + 5000;
    while (!got.includes("status:cancelled") && Date.now() < deadline) await new Promise((r) => setTimeout(r, 50));
    expect(got).toContain("status:cancelled");
    unsubscribe();
    await hub.close();
  });
});
