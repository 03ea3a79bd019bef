import { sql } from "drizzle-orm";
import type { Db } from "../../db/client";
import { UnavailableError } from "../../lib/errors";
import type { Logger } from "../../lib/logger";

export class HealthService {
  constructor(private readonly deps: { db: Db; logger: Logger }) {}

  /** Resolves when the database answers `select 1`; throws UnavailableError otherwise. */
  async check(): Promise<{ ok: true }> {
    try {
      await this.deps.db.execute(sql`select 1`);
    } catch (err) {
      this.deps.logger.warn("health check: database not reachable", { message: (err as Error).message });
      throw new UnavailableError("The database is not reachable");
    }
    return { ok: true };
  }
}

export function createHealthService(deps: { db: Db; logger: Logger }): HealthService {
  return new HealthService(deps);
}
