import { existsSync } from "node:fs";
import http from "node:http";
import type { AddressInfo } from "node:net";
import path from "node:path";
import { desc, eq } from "drizzle-orm";
import { createApp, type AppHandle } from "../../server/app";
import { openDatabase } from "../../server/db/client";
import { outbox, users } from "../../server/db/schema/index";
import { seedDemoLab } from "../../server/db/seed/demo-lab";
import { seedDemoMaps, type SeededMap } from "../../server/db/seed/demo-maps";
import { mapFinishedMailHook } from "../../server/jobs/map-finished.job";
import { createGroupsService } from "../../server/modules/groups/groups.service";
import { bossMapJobs } from "../../server/modules/maps/maps.jobs";
import { createMapsService } from "../../server/modules/maps/maps.service";
import { createComputePool, type ComputePool } from "../../server/jobs/compute-pool";
import { startJobWorkers, type JobWorkers } from "../../server/jobs/job-workers";
import { logger } from "../../server/lib/logger";
import { createBoss, type PgBoss } from "../../server/queue/boss";
import { startFakeSmtp } from "../../server/mail/fake-smtp";
import { createMailer } from "../../server/mail/mailer";
import { insertOutboxMessage } from "../../server/mail/outbox.repo";
import { createTestDatabase } from "./db-template";

/** The built client the product serves; scripts/test.sh builds it before vitest runs. */
export const DIST_DIR = path.resolve(import.meta.dirname, "../../dist");

/**
 * The real product for browser tests: createApp with the built client from dist/, on an
 * ephemeral loopback port, a fresh clone of the migrated test database, and the SMTP fake
 * (port 0) storing mail in the outbox, exactly as `npm start` wires them. With `worker: true`
 * the app also gets pg-boss and an in-process map worker (one engine thread), so maps fill.
 */
export async function startE2eApp(options: { clientDir?: string; worker?: boolean } = {}) {
  const clientDir = options.clientDir ?? DIST_DIR;
  if (!existsSync(path.join(clientDir, "index.html"))) {
    throw new Error(`${clientDir}/index.html is missing: build the client first (\`npx vite build\`; \`npm test\` does it)`);
  }
  const testDb = await createTestDatabase();
  const database = openDatabase(testDb.url, { max: 5 });
  const smtp = await startFakeSmtp({ port: 0, onMessage: (m) => insertOutboxMessage(database.db, m) });
  const mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "Equilibrist <no-reply@equilibrist.test>" });

  const server = http.createServer();
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  const baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

  let boss: PgBoss | undefined;
  let compute: ComputePool | undefined;
  let workers: JobWorkers | undefined;
  if (options.worker) {
    boss = await createBoss(testDb.url, { max: 4, maintenanceIntervalSeconds: 5, applicationName: "equilibrist-e2e" });
    compute = createComputePool({ threads: 1 });
    workers = await startJobWorkers({
      db: database.db, boss, compute, workerName: "e2e-worker", logger, pollingIntervalSeconds: 0.5,
      onMapFinished: mapFinishedMailHook({ db: database.db, mailer, appUrl: baseUrl, logger }),
    });
  }
  const handle: AppHandle = createApp({
    database,
    mailer,
    boss,
    clientDir,
    config: { appUrl: baseUrl, sessionSecret: "e2e-session-secret-0123456789abcdef" },
  });
  server.on("request", handle.app);

  return {
    baseUrl,
    /** Inserts the demo lab of `npm start` (its people share the demo password). */
    async seedDemo(): Promise<void> {
      await seedDemoLab(database.db);
    },
    /** The demo lab's prepared maps, queued for the in-process worker (needs `worker: true`). */
    async seedDemoMaps(): Promise<SeededMap[]> {
      if (!boss) throw new Error("seedDemoMaps needs startE2eApp({ worker: true })");
      await seedDemoLab(database.db);
      const mapsService = createMapsService({ db: database.db, groups: createGroupsService({ db: database.db }), appUrl: baseUrl, jobs: bossMapJobs(boss) });
      return seedDemoMaps(database.db, mapsService);
    },
    /** Newest outbox message sent to `to` (undefined when none). */
    async lastMailTo(to: string) {
      const [row] = await database.db.select().from(outbox).where(eq(outbox.to, to)).orderBy(desc(outbox.createdAt)).limit(1);
      return row;
    },
    /** Gives an existing account the site role admin (the seed does this for the demo lab). */
    async makeAdmin(email: string): Promise<void> {
      await database.db.update(users).set({ siteRole: "admin" }).where(eq(users.email, email));
    },
    async stop(): Promise<void> {
      await new Promise<void>((resolve) => {
        server.close(() => resolve());
        server.closeAllConnections();
      });
      await handle.close();
      await workers?.stop();
      await boss?.stop({ graceful: false, close: true, wait: true });
      await compute?.close();
      mailer.close();
      await smtp.close();
      await database.close();
      await testDb.drop();
    },
  };
}

export type E2eApp = Awaited<ReturnType<typeof startE2eApp>>;
