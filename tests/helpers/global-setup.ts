// Vitest global setup. Database-backed tests clone a template database migrated once here;
// pure engine/theory tests need no database, so this does nothing without TEST_DATABASE_ADMIN_URL.
export default async function setup() {
  if (!process.env.TEST_DATABASE_ADMIN_URL) return;
  const { prepareTemplateDatabase } = await import("./db-template");
  await prepareTemplateDatabase(process.env.TEST_DATABASE_ADMIN_URL);
}
