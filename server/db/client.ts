import pg from "pg";
import { drizzle, type NodePgDatabase } from "drizzle-orm/node-postgres";
import * as schema from "./schema/index";
import { logger } from "../lib/logger";

export type Db = NodePgDatabase<typeof schema>;
/** A transaction handle; repos accept either a Db or a Tx. */
export type Tx = Parameters<Parameters<Db["transaction"]>[0]>[0];
export type Executor = Db | Tx;

export interface Database {
  pool: pg.Pool;
  db: Db;
  close: () => Promise<void>;
}

export interface DatabaseOptions {
  /** Most connections this process holds open (default 10). */
  max?: number;
}

/**
 * Opens a pg.Pool on `url` and wraps it in Drizzle. The pool gets an error handler: an idle
 * client dropped by the server (restart, shutdown) is logged instead of crashing the process.
 */
export function openDatabase(url: string, options: DatabaseOptions = {}): Database {
  const pool = new pg.Pool({ connectionString: url, max: options.max ?? 10 });
  pool.on("error", (err) => logger.warn("idle database client failed", { message: err.message }));
  const db = drizzle({ client: pool, schema });
  let closed = false;
  return {
    pool,
    db,
    close: async () => {
      if (closed) return;
      closed = true;
      await pool.end();
    },
  };
}
