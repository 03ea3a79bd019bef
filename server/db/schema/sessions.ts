import { index, json, pgTable, timestamp, varchar } from "drizzle-orm/pg-core";

/**
 * express-session store of connect-pg-simple (its documented table layout, under the name
 * "sessions"). Created here by a migration, so the store runs with createTableIfMissing false.
 */
export const sessions = pgTable(
  "sessions",
  {
    sid: varchar("sid").primaryKey(),
    sess: json("sess").notNull(),
    expire: timestamp("expire", { precision: 6 }).notNull(),
  },
  (t) => [index("sessions_expire_idx").on(t.expire)],
);
