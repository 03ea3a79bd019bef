import { availableParallelism, hostname } from "node:os";
import { z } from "zod";
import { openDatabase } from "./db/client";
import { createComputePool } from "./jobs/compute-pool";
import { startJobWorkers } from "./jobs/job-workers";
import { mapFinishedMailHook } from "./jobs/map-finished.job";
import { logger } from "./lib/logger";
import { createMailer } from "./mail/mailer";
import { createBoss } from "./queue/boss";

// Worker process entry (`npm run worker`): takes map jobs from pg-boss and computes cells in a
// thread pool over every core. Start as many as you like, here or on other machines, against
// the same DATABASE_URL. SIGTERM/SIGINT: stop taking jobs, let running cells finish for up to
// WORKER_STOP_SECONDS, then hand unfinished jobs back to the queue (retried elsewhere).

const envSchema = z.object({
  DATABASE_URL: z.string({ error: "DATABASE_URL is required" }).regex(/^postgres(ql)?:\/\//, "DATABASE_URL must start with postgres://"),
  WORKER_THREADS: z.coerce.number().int().min(1).max(256).optional(),
  WORKER_NAME: z.string().min(1).max(200).optional(),
  WORKER_POLL_SECONDS: z.coerce.number().min(0.5).max(60).default(2),
  WORKER_STOP_SECONDS: z.coerce.number().min(1).max(3600).default(30),
  /** Shortens pg-boss maintenance (expiring jobs of dead workers) — tests use 1. */
  QUEUE_MAINTENANCE_SECONDS: z.coerce.number().int().min(1).max(3600).default(60),
  /** The "map finished" e-mail: SMTP relay and the public origin its link points at (as server/env.ts). */
  SMTP_HOST: z.string().min(1).default("127.0.0.1"),
  SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  MAIL_FROM: z.string().min(3).default("Equilibrist <no-reply@equilibrist.local>"),
  APP_URL: z.url().optional(),
  PORT: z.coerce.number().int().min(1).max(65535).default(4310),
});

const parsed = envSchema.safeParse(Object.fromEntries(Object.entries(process.env).filter(([, v]) => v)));
if (!parsed.success) {
  const lines = parsed.error.issues.map((i) => `  ${i.path.join(".")}: ${i.message}`);
  process.stderr.write(`[equilibrist worker] the environment is not valid:\n${lines.join("\n")}\n`);
  process.exit(1);
}
const env = parsed.data;
const threads = env.WORKER_THREADS ?? availableParallelism();
const workerName = env.WORKER_NAME ?? `${hostname()}:${process.pid}`;

const database = openDatabase(env.DATABASE_URL, { max: threads + 2 });
const boss = await createBoss(env.DATABASE_URL, { maintenanceIntervalSeconds: env.QUEUE_MAINTENANCE_SECONDS, applicationName: `equilibrist-worker ${workerName}` });
const compute = createComputePool({ threads });
const mailer = createMailer({ host: env.SMTP_HOST, port: env.SMTP_PORT, from: env.MAIL_FROM });
const appUrl = env.APP_URL ?? `http://127.0.0.1:${env.PORT}`;
const workers = await startJobWorkers({
  db: database.db, boss, compute, workerName, logger, pollingIntervalSeconds: env.WORKER_POLL_SECONDS,
  onMapFinished: mapFinishedMailHook({ db: database.db, mailer, appUrl, logger }),
});
logger.info("worker ready", { worker: workerName, threads });
process.stdout.write(`[equilibrist] worker ${workerName} ready with ${threads} thread${threads === 1 ? "" : "s"}\n`);

let stopping = false;
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  logger.info(`${signal}: worker stopping`, { worker: workerName });
  const force = setTimeout(() => process.exit(1), (env.WORKER_STOP_SECONDS + 15) * 1000);
  force.unref();
  await workers.stop();
  // Waits for running jobs up to the timeout, then fails the rest so pg-boss retries them.
  await boss.stop({ graceful: true, wait: true, timeout: env.WORKER_STOP_SECONDS * 1000 });
  await workers.close();
  await compute.close();
  mailer.close();
  await database.close();
  process.exit(0);
}
process.once("SIGTERM", () => void shutdown("SIGTERM"));
process.once("SIGINT", () => void shutdown("SIGINT"));
