import { randomBytes } from "node:crypto";
import pg from "pg";
import { migrateDatabase } from "../../server/db/migrate";

export const TEMPLATE_DB = "equilibrist_template";
const TEST_DB_PREFIX = "eqtest_";

function withDatabase(adminUrl: string, name: string): string {
  const url = new URL(adminUrl);
  url.pathname = `/${name}`;
  return url.toString();
}

async function withAdmin<T>(adminUrl: string, fn: (client: pg.Client) => Promise<T>): Promise<T> {
  const client = new pg.Client({ connectionString: adminUrl });
  client.on("error", () => undefined); // the server may drop us at shutdown; nothing to do then
  await client.connect();
  try {
    return await fn(client);
  } finally {
    await client.end();
  }
}

/**
 * Drops and recreates the template database from drizzle/ migrations, and drops databases left
 * by earlier test runs. Called once per vitest run by tests/helpers/global-setup.ts.
 */
export async function prepareTemplateDatabase(adminUrl: string): Promise<void> {
  await withAdmin(adminUrl, async (client) => {
    const stale = await client.query<{ datname: string }>(
      "select datname from pg_database where datname like $1 or datname = $2",
      [`${TEST_DB_PREFIX}%`, TEMPLATE_DB],
    );
    for (const { datname } of stale.rows) await client.query(`drop database if exists "${datname}" with (force)`);
    await client.query(`create database "${TEMPLATE_DB}"`);
  });
  await migrateDatabase(withDatabase(adminUrl, TEMPLATE_DB));
}

export interface TestDatabase {
  url: string;
  name: string;
  drop: () => Promise<void>;
}

/** The admin URL of the throwaway server, or a clear failure telling how to run DB tests. */
export function requireAdminUrl(): string {
  const url = process.env.TEST_DATABASE_ADMIN_URL;
  if (!url) {
    throw new Error(
      "TEST_DATABASE_ADMIN_URL is not set: database tests need the throwaway PostgreSQL that `npm test` starts. Run `npm test -- tests/server` (not bare vitest).",
    );
  }
  return url;
}

/** Clones the migrated template into a fresh, uniquely named database for one test file. */
export async function createTestDatabase(): Promise<TestDatabase> {
  const adminUrl = requireAdminUrl();
  const name = `${TEST_DB_PREFIX}${process.pid}_${randomBytes(4).toString("hex")}`;
  await withAdmin(adminUrl, async (client) => {
    for (let attempt = 1; ; attempt++) {
      try {
        await client.query(`create database "${name}" template "${TEMPLATE_DB}"`);
        return;
      } catch (err) {
        // Two clones starting at once can see each other on the template ("being accessed by other users").
        if (attempt >= 10 || !/being accessed/.test((err as Error).message)) throw err;
        await new Promise((r) => setTimeout(r, 200 * attempt));
      }
    }
  });
  return {
    url: withDatabase(adminUrl, name),
    name,
    drop: () => withAdmin(adminUrl, async (client) => void (await client.query(`drop database if exists "${name}" with (force)`))),
  };
}
