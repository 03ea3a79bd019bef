import path from "node:path";
import { fileURLToPath } from "node:url";
import { migrate } from "drizzle-orm/node-postgres/migrator";
import { openDatabase } from "./client";

/** The generated SQL migrations (drizzle/ at the repository root). */
export const migrationsFolder = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../drizzle");

/** Applies every pending migration in drizzle/ to the database at `url`. */
export async function migrateDatabase(url: string): Promise<void> {
  const database = openDatabase(url, { max: 1 });
  try {
    await migrate(database.db, { migrationsFolder });
  } finally {
    await database.close();
  }
}
