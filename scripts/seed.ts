import { openDatabase } from "../server/db/client";
import { DEMO_GROUP, DEMO_PASSWORD, seedDemoLab } from "../server/db/seed/demo-lab";

// Idempotent demo scenario for `npm start`; prints the demo sign-ins.
const url = process.env.DATABASE_URL;
if (!url) {
  process.stderr.write("[equilibrist] DATABASE_URL is not set (postgres://user@host:port/db)\n");
  process.exit(1);
}
const database = openDatabase(url, { max: 2 });
try {
  const people = await seedDemoLab(database.db);
  const lines = people.map((p) => `  ${p.email.padEnd(42)} ${DEMO_PASSWORD}   (${p.about})`);
  const kept = people.some((p) => !p.created) ? "\n  (accounts that already existed were left as they are: a password changed since still applies)" : "";
  process.stdout.write(`[equilibrist] demo lab "${DEMO_GROUP}" — sign in with:\n${lines.join("\n")}${kept}\n`);
} finally {
  await database.close();
}
