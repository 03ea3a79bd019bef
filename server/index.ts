import { existsSync } from "node:fs";
import http from "node:http";
import path from "node:path";
import { fileURLToPath } from "node:url";
import { createApp } from "./app";
import { openDatabase } from "./db/client";
import { loadEnv } from "./env";
import { logger } from "./lib/logger";
import { createMailer } from "./mail/mailer";
import { createBoss } from "./queue/boss";

// Process entry: connect, listen on loopback, serve the built client, stop cleanly on signals.
const env = loadEnv();
const database = openDatabase(env.DATABASE_URL);
const mailer = createMailer({ host: env.SMTP_HOST, port: env.SMTP_PORT, from: env.MAIL_FROM });
const dist = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../dist");
const clientDir = existsSync(path.join(dist, "index.html")) ? dist : undefined;
if (!clientDir) logger.warn("no built client in dist/ (run `npx vite build`); serving the API only");

// The web process only enqueues (maps are created with their jobs in one transaction);
// worker processes (`npm run worker`) take the jobs.
const boss = await createBoss(env.DATABASE_URL, { applicationName: "equilibrist-web" });

const handle = createApp({
  database,
  boss,
  mailer,
  clientDir,
  config: { appUrl: env.APP_URL, sessionSecret: env.SESSION_SECRET },
});
const server = http.createServer(handle.app);

server.listen(env.PORT, "127.0.0.1", () => {
  process.stdout.write(`[equilibrist] serving ${env.APP_URL} (listening on http://127.0.0.1:${env.PORT})\n`);
});
server.on("error", (err) => {
  logger.error("server failed", { message: err.message });
  process.exit(1);
});

let stopping = false;
async function shutdown(signal: string): Promise<void> {
  if (stopping) return;
  stopping = true;
  logger.info(`${signal}: shutting down`);
  const force = setTimeout(() => process.exit(1), 10_000);
  force.unref();
  await new Promise<void>((resolve) => {
    server.close(() => resolve());
    server.closeIdleConnections();
  });
  await handle.close();
  await boss.stop({ graceful: false, wait: true });
  mailer.close();
  await database.close();
  process.exit(0);
}
process.once("SIGTERM", () => void shutdown("SIGTERM"));
process.once("SIGINT", () => void shutdown("SIGINT"));
