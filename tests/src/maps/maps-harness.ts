import type { TestClient } from "../../helpers/http-client";
import { startTestApp, type TestApp } from "../../helpers/test-app";
import { spawnWorker, type WorkerProcess } from "../../server/worker/worker-process";

/** A small rate-network map that fills in a few seconds on one thread (4 cells, N = 4). */
export const TINY_RATE_MAP = {
  title: "Tiny leak sweep",
  ensemble: "rate",
  settings: { N: 4, g: 1.2, nonlinearity: "tanh", input: 0 },
  mu: { min: 0.5, max: 2.5, steps: 2, scale: "linear" },
  tau: { min: 0, max: 0.8, steps: 2, scale: "linear" },
  budget: { networks: 2, starts: 4, tMax: 60 },
  seed: 11,
  visibility: "private",
} as const;

/**
 * The real app with pg-boss and, when asked, a worker process (`server/worker.ts`, one engine
 * thread) on the same database. A separate process, because the engine's thread pool cannot
 * locate its worker file from inside the jsdom test environment.
 */
export async function startMapsApp(options: { worker: boolean }) {
  const app: TestApp = await startTestApp({ queue: true });
  let worker: WorkerProcess | undefined;
  if (options.worker) worker = await spawnWorker(app.database.pool.options.connectionString!);
  return {
    app,
    async stop() {
      if (worker) {
        worker.child.kill("SIGTERM");
        await worker.exited;
      }
      await app.stop();
    },
  };
}

/** Creates a map through the API and waits until every cell is stored. */
export async function createFilledMap(client: TestClient, body: object = TINY_RATE_MAP, timeoutMs = 60_000): Promise<{ id: string }> {
  const res = await client.post("/api/maps", body);
  if (res.status !== 201) throw new Error(`create failed: ${res.status} ${JSON.stringify(res.body)}`);
  const id = res.body.id as string;
  const until = Date.now() + timeoutMs;
  for (;;) {
    const m = await client.get(`/api/maps/${id}`);
    if (m.body.status === "done") return { id };
    if (m.body.status === "failed") throw new Error(`map failed: ${m.body.failure}`);
    if (Date.now() > until) throw new Error(`map not done in time: ${JSON.stringify(m.body)}`);
    await new Promise((r) => setTimeout(r, 250));
  }
}
