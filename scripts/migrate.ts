import { migrateDatabase } from "../server/db/migrate";

// Applies drizzle/ migrations to DATABASE_URL (used by `npm start`, `npm run db:migrate`).
const url = process.env.DATABASE_URL;
if (!url) {
  process.stderr.write("[equilibrist] DATABASE_URL is not set (postgres://user@host:port/db)\n");
  process.exit(1);
}
await migrateDatabase(url);
process.stdout.write("[equilibrist] database migrated\n");
