import { z } from "zod";
import { openDatabase } from "../db/client";
import { logger } from "../lib/logger";
import { startFakeSmtp } from "./fake-smtp";
import { insertOutboxMessage } from "./outbox.repo";

// The process `npm start` runs beside the server: the loopback SMTP fake, storing every message
// in the outbox table where the admin outbox page shows it.
const env = z
  .object({
    DATABASE_URL: z.string().regex(/^postgres(ql)?:\/\//, "DATABASE_URL must be a postgres:// URL"),
    SMTP_PORT: z.coerce.number().int().min(1).max(65535).default(2525),
  })
  .safeParse(process.env);
if (!env.success) {
  process.stderr.write(`[equilibrist] fake SMTP: ${env.error.issues.map((i) => `${i.path.join(".")}: ${i.message}`).join("; ")}\n`);
  process.exit(1);
}

const database = openDatabase(env.data.DATABASE_URL, { max: 2 });
const smtp = await startFakeSmtp({
  port: env.data.SMTP_PORT,
  onMessage: async (mail) => {
    await insertOutboxMessage(database.db, mail);
    logger.info("mail caught in the outbox", { to: mail.to, subject: mail.subject });
  },
});
logger.info(`fake SMTP listening on 127.0.0.1:${smtp.port}`);

async function shutdown(): Promise<void> {
  await smtp.close();
  await database.close();
  process.exit(0);
}
process.once("SIGTERM", () => void shutdown());
process.once("SIGINT", () => void shutdown());
