import http from "node:http";
import type { AddressInfo } from "node:net";
import { desc, eq } from "drizzle-orm";
import { createApp, type AppConfig, type AppHandle } from "../../server/app";
import { openDatabase, type Database } from "../../server/db/client";
import { outbox, users } from "../../server/db/schema/index";
import { startFakeSmtp, type FakeSmtp } from "../../server/mail/fake-smtp";
import { createMailer, type Mailer } from "../../server/mail/mailer";
import { insertOutboxMessage } from "../../server/mail/outbox.repo";
import { createBoss, type PgBoss } from "../../server/queue/boss";
import { createTestDatabase, type TestDatabase } from "./db-template";
import { createClient, type TestClient } from "./http-client";

export interface TestAppOptions {
  config?: Partial<Omit<AppConfig, "appUrl">>;
  /** Start pg-boss on the test database and give it to the app (map jobs are enqueued; no worker runs them). */
  queue?: boolean;
}

/**
 * The real app on an ephemeral port against a fresh clone of the migrated template database,
 * with the SMTP fake in-process (port 0) storing mail in the outbox table.
 */
export async function startTestApp(options: TestAppOptions = {}) {
  const testDb: TestDatabase = await createTestDatabase();
  const database: Database = openDatabase(testDb.url, { max: 5 });
  const smtp: FakeSmtp = await startFakeSmtp({ port: 0, onMessage: (m) => insertOutboxMessage(database.db, m) });
  const mailer: Mailer = createMailer({ host: "127.0.0.1", port: smtp.port, from: "Equilibrist <no-reply@equilibrist.test>" });
  const boss: PgBoss | undefined = options.queue ? await createBoss(testDb.url, { max: 2 }) : undefined;

  let server: http.Server;
  let handle: AppHandle;
  let baseUrl = "";

  /** (Re)starts the HTTP app with its own pool, as a new server process would. */
  async function boot(appDatabase: Database = database): Promise<void> {
    server = http.createServer();
    await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
    baseUrl = `http://127.0.0.1:${(server.address() as AddressInfo).port}`;
    handle = createApp({
      database: appDatabase,
      mailer,
      boss,
      config: { appUrl: baseUrl, sessionSecret: "test-session-secret-0123456789", ...options.config },
    });
    server.on("request", handle.app);
  }

  async function shutdownHttp(): Promise<void> {
    await new Promise<void>((resolve) => {
      server.close(() => resolve());
      server.closeAllConnections();
    });
    await handle.close();
  }

  await boot();

  return {
    database,
    /** The app's pg-boss when started with `queue: true`. */
    boss,
    get baseUrl() {
      return baseUrl;
    },
    client: (): TestClient => createClient(baseUrl),
    /** A new createApp on the same database (the old server is closed first). */
    async restart(): Promise<void> {
      await shutdownHttp();
      await boot();
    },
    /** Starts a separate app instance on `appDatabase` (for failure tests with a closed pool). */
    async bootWith(appDatabase: Database): Promise<void> {
      await shutdownHttp();
      await boot(appDatabase);
    },
    /** Newest outbox message sent to `to`. */
    async lastMailTo(to: string) {
      const [row] = await database.db.select().from(outbox).where(eq(outbox.to, to)).orderBy(desc(outbox.createdAt)).limit(1);
      return row;
    },
    async makeAdmin(email: string): Promise<void> {
      await database.db.update(users).set({ siteRole: "admin" }).where(eq(users.email, email));
    },
    async stop(): Promise<void> {
      await shutdownHttp();
      await boss?.stop({ graceful: false, close: true, wait: true });
      mailer.close();
      await smtp.close();
      await database.close();
      await testDb.drop();
    },
  };
}

export type TestApp = Awaited<ReturnType<typeof startTestApp>>;

let counter = 0;

/** A unique, valid registration body. */
export function newPerson(label = "person") {
  counter += 1;
  const tag = `${label}${counter}-${process.pid}`;
  return { email: `${tag}@lab.example`, password: `pw-${tag}-long-enough`, name: `Test ${label} ${counter}` };
}

/** Registers a new person on a fresh client (signed in) and returns both. */
export async function signedInPerson(app: TestApp, label?: string) {
  const person = newPerson(label);
  const client = app.client();
  const res = await client.post("/api/auth/register", person);
  if (res.status !== 201) throw new Error(`register failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { ...person, id: res.body.id as string, client };
}

/** Pulls the token out of a link in an e-mail body (`…/reset?token=X` or `…/invites/X`). */
export function tokenFromMail(text: string, kind: "reset" | "invite"): string {
  const match = kind === "reset" ? /\/reset\?token=([A-Za-z0-9_%-]+)/.exec(text) : /\/invites\/([A-Za-z0-9_%-]+)/.exec(text);
  if (!match) throw new Error(`no ${kind} link in mail: ${text}`);
  return decodeURIComponent(match[1]);
}
