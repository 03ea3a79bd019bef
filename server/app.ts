import path from "node:path";
import connectPgSimple from "connect-pg-simple";
import express, { type Express } from "express";
import session from "express-session";
import helmet from "helmet";
import type { Database } from "./db/client";
import { apiNotFound, errorHandler } from "./lib/error-handler";
import { logger as defaultLogger, type Logger } from "./lib/logger";
import { originCheck } from "./lib/origin-check";
import type { Mailer } from "./mail/mailer";
import { createAccountRouter } from "./modules/account/account.router";
import { createAccountService } from "./modules/account/account.service";
import { createAdminRouter } from "./modules/admin/admin.router";
import { createAdminService } from "./modules/admin/admin.service";
import { createAuthRouter } from "./modules/auth/auth.router";
import { createAuthService, type AuthLimits } from "./modules/auth/auth.service";
import { loadActor, SESSION_COOKIE } from "./modules/auth/session";
import { createGroupsRouter } from "./modules/groups/groups.router";
import { createGroupsService } from "./modules/groups/groups.service";
import { createInvitesService } from "./modules/groups/invites.service";
import { createHealthRouter } from "./modules/health/health.router";
import { createHealthService } from "./modules/health/health.service";
import { createMapEventsHub } from "./modules/maps/map-events.hub";
import { createMapEventsRouter } from "./modules/maps/map-events.router";
import { createMapReadsService } from "./modules/maps/map-reads.service";
import { bossMapJobs, noMapJobs } from "./modules/maps/maps.jobs";
import { createMapsRouter } from "./modules/maps/maps.router";
import { createMapsService } from "./modules/maps/maps.service";
import { createProbePool } from "./modules/probes/probe.pool";
import { createProbesRouter } from "./modules/probes/probes.router";
import { createProbesService } from "./modules/probes/probes.service";
import type { PgBoss } from "./queue/boss";
import { createReviewRouter } from "./modules/review/review.router";
import { createReviewService } from "./modules/review/review.service";
import { createTheoryRouter } from "./modules/theory/theory.router";

export interface AppConfig {
  /** Public origin of the product, e.g. http://127.0.0.1:4310 (links in e-mails, Origin check). */
  appUrl: string;
  sessionSecret: string;
  /** Sign-in and reset rate limits (defaults in auth.service.ts). */
  authLimits?: Partial<AuthLimits>;
  /** Largest JSON body accepted (default "1mb"); larger bodies get 413. */
  bodyLimit?: string;
  /** Express "trust proxy" setting when a reverse proxy sits in front (default false). */
  trustProxy?: boolean | number | string;
}

export interface AppDeps {
  database: Pick<Database, "db" | "pool">;
  mailer: Mailer;
  config: AppConfig;
  logger?: Logger;
  /** Built client (dist/): served with an SPA fallback for every non-/api path. */
  clientDir?: string;
  /** Started pg-boss (server/queue/boss.ts) for map jobs; without it creating a map answers 503. */
  boss?: PgBoss;
}

export interface AppHandle {
  app: Express;
  /** Stops the session store's and the rate limits' pruning timers; the caller closes the database and mailer. */
  close: () => Promise<void>;
}

const SESSION_MAX_AGE_MS = 30 * 24 * 60 * 60_000;
const PRUNE_INTERVAL_MS = 15 * 60_000;

/** Builds the Express app (no listen): security middleware, sessions, API routers, errors. */
export function createApp(deps: AppDeps): AppHandle {
  const { db, pool } = deps.database;
  const logger = deps.logger ?? defaultLogger;
  const { config } = deps;
  const https = config.appUrl.startsWith("https:");

  const auth = createAuthService({ db, mailer: deps.mailer, appUrl: config.appUrl, logger, limits: config.authLimits });
  const groups = createGroupsService({ db });
  const invites = createInvitesService({ db, mailer: deps.mailer, appUrl: config.appUrl, groups });
  const admin = createAdminService({ db });
  const health = createHealthService({ db, logger });
  const maps = createMapsService({ db, groups, appUrl: config.appUrl, jobs: deps.boss ? bossMapJobs(deps.boss) : noMapJobs });
  const mapReads = createMapReadsService({ db, maps });
  const mapEvents = createMapEventsHub({ db, pool, logger });
  const probePool = createProbePool({ threads: 1 });
  const probes = createProbesService({ db, groups, pool: probePool, boss: deps.boss });
  const review = createReviewService({ db, maps });
  const account = createAccountService({ db });

  const PgStore = connectPgSimple(session);
  const store = new PgStore({
    pool,
    tableName: "sessions",
    createTableIfMissing: false,
    errorLog: (...args: unknown[]) => logger.error("session store", { detail: args.map(String).join(" ") }),
  });

  const prune = setInterval(() => {
    auth.pruneRateLimits().catch((err: Error) => logger.warn("rate-limit pruning failed", { message: err.message }));
  }, PRUNE_INTERVAL_MS);
  prune.unref();

  const app = express();
  app.set("trust proxy", config.trustProxy ?? false);
  app.use(
    helmet({
      // Over plain http (loopback) neither HSTS nor upgrading subresources to https makes sense.
      strictTransportSecurity: https,
      contentSecurityPolicy: { directives: { upgradeInsecureRequests: https ? [] : null } },
    }),
  );
  app.use(originCheck(config.appUrl));
  app.use(express.json({ limit: config.bodyLimit ?? "1mb" }));
  app.use(
    "/api",
    session({
      name: SESSION_COOKIE,
      secret: config.sessionSecret,
      store,
      resave: false,
      saveUninitialized: false,
      cookie: { httpOnly: true, sameSite: "lax", secure: https, maxAge: SESSION_MAX_AGE_MS, path: "/" },
    }),
    loadActor(auth),
  );

  app.use(createHealthRouter(health));
  app.use(createAuthRouter(auth));
  app.use(createGroupsRouter(groups, invites));
  app.use(createAdminRouter(admin));
  app.use(createTheoryRouter());
  app.use(createMapsRouter(maps, mapReads));
  app.use(createReviewRouter(review));
  app.use(createAccountRouter(account));
  app.use(createMapEventsRouter({ hub: mapEvents, canRead: (actor, id, token) => maps.getReadable(actor, id, token) }));
  app.use(createProbesRouter(probes));
  app.use("/api", apiNotFound);

  if (deps.clientDir) {
    const clientDir = path.resolve(deps.clientDir);
    app.use(express.static(clientDir, { index: false, maxAge: "1h" }));
    app.get("/{*splat}", (_req, res) => res.sendFile(path.join(clientDir, "index.html")));
  }

  app.use(errorHandler(logger));
  return {
    app,
    close: async () => {
      clearInterval(prune);
      await mapEvents.close();
      await probePool.close();
      await store.close();
    },
  };
}
