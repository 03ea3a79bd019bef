import { sql } from "drizzle-orm";
import type { Db } from "../../db/client";
import { UnavailableError } from "../../lib/errors";
import type { Logger } from "../../lib/logger";

export function createHealthService(deps: { db: Db; logger: Logger }) {
  return {
    /** Resolves when the database answers `select 1`; throws UnavailableError otherwise. */
    async check(): Promise<{ ok: true }> {
      try {
        await deps.db.execute(sql`select 1`);
      } catch (err) {
        deps.logger.warn("health check: database not reachable", { message: (err as Error).message });
        throw new UnavailableError("The database is not reachable");
      }
      return { ok: true };
    },
  };
}

export type HealthService = ReturnType<typeof createHealthService>;
