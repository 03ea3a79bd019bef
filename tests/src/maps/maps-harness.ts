import { createComputePool, type ComputePool } from "../../../server/jobs/compute-pool";
import { startJobWorkers, type JobWorkers } from "../../../server/jobs/job-workers";
import { logger } from "../../../server/lib/logger";
import type { TestClient } from "../../helpers/http-client";
import { startTestApp, type TestApp } from "../../helpers/test-app";

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

/** The real app with pg-boss and, when asked, an in-process map worker on one engine thread. */
export async function startMapsApp(options: { worker: boolean }) {
  const app: TestApp = await startTestApp({ queue: true });
  let compute: ComputePool | undefined;
  let workers: JobWorkers | undefined;
  if (options.worker) {
    compute = createComputePool({ threads: 1 });
    workers = await startJobWorkers({ db: app.database.db, boss: app.boss!, compute, workerName: "client-test", logger, pollingIntervalSeconds: 0.5 });
  }
  return {
    app,
    async stop() {
      await workers?.stop();
      await app.stop();
      await compute?.close();
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
