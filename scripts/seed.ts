import { pagePaths } from "../shared/schemas/api-paths";
import { openDatabase } from "../server/db/client";
import { DEMO_GROUP, DEMO_PASSWORD, seedDemoLab } from "../server/db/seed/demo-lab";
import { seedDemoMaps } from "../server/db/seed/demo-maps";
import { createGroupsService } from "../server/modules/groups/groups.service";
import { bossMapJobs } from "../server/modules/maps/maps.jobs";
import { createMapsService } from "../server/modules/maps/maps.service";
import { createBoss } from "../server/queue/boss";

// Idempotent demo scenario for `npm start`; prints the demo sign-ins and the demo maps' links.
const url = process.env.DATABASE_URL;
if (!url) {
  process.stderr.write("[equilibrist] DATABASE_URL is not set (postgres://user@host:port/db)\n");
  process.exit(1);
}
const appUrl = (process.env.APP_URL ?? `http://127.0.0.1:${process.env.PORT ?? 4310}`).replace(/\/+$/, "");
const database = openDatabase(url, { max: 2 });
const boss = await createBoss(url, { max: 2 });
try {
  const people = await seedDemoLab(database.db);
  const lines = people.map((p) => `  ${p.email.padEnd(42)} ${DEMO_PASSWORD}   (${p.about})`);
  const kept = people.some((p) => !p.created) ? "\n  (accounts that already existed were left as they are: a password changed since still applies)" : "";
  process.stdout.write(`[equilibrist] demo lab "${DEMO_GROUP}" — sign in with:\n${lines.join("\n")}${kept}\n`);
  const mapsService = createMapsService({ db: database.db, groups: createGroupsService({ db: database.db }), appUrl, jobs: bossMapJobs(boss) });
  const seeded = await seedDemoMaps(database.db, mapsService);
  const mapLines = seeded.map((m) => `  ${m.title}${m.created ? " (queued: the worker computes it now)" : ""}${m.shareToken ? `\n    read-only link: ${appUrl}${pagePaths.sharedMap(m.shareToken)}` : ""}`);
  process.stdout.write(`[equilibrist] demo maps:\n${mapLines.join("\n")}\n`);
} finally {
  await boss.stop({ graceful: false });
  await database.close();
}
