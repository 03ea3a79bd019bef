import { index, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";

/** Every e-mail the local SMTP fake received, as parsed from the wire. */
export const outbox = pgTable(
  "outbox",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    to: text("to_address").notNull(),
    from: text("from_address").notNull(),
    subject: text("subject").notNull(),
    text: text("text").notNull(),
    html: text("html"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("outbox_created_idx").on(t.createdAt)],
);
