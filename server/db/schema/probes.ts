import { customType, doublePrecision, index, integer, jsonb, pgEnum, pgTable, text, timestamp, uuid } from "drizzle-orm/pg-core";
import { groups } from "./groups";
import { users } from "./users";

/** Raw bytes (PostgreSQL bytea) as a Node Buffer. */
const bytea = customType<{ data: Buffer; driverData: Buffer }>({ dataType: () => "bytea" });

export const probeStatus = pgEnum("probe_status", ["ready", "searching", "done", "failed"]);

/**
 * An uploaded coupling matrix and its analysis. The matrix is stored as little-endian float64,
 * row-major (N·N·8 bytes); the optional constant input vector likewise (N·8 bytes).
 */
export const probes = pgTable(
  "probes",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: uuid("owner_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    groupId: uuid("group_id").references(() => groups.id, { onDelete: "set null" }),
    title: text("title").notNull(),
    fileName: text("file_name").notNull(),
    format: text("format").notNull(),
    n: integer("n").notNull(),
    matrix: bytea("matrix").notNull(),
    input: bytea("input"),
    mu: doublePrecision("mu").notNull(),
    nonlinearity: text("nonlinearity").notNull().default("tanh"),
    /** Estimated g, τ, mean and diagonal statistics of the matrix. */
    stats: jsonb("stats").notNull(),
    /** Eigenvalues of the matrix { re, im } (computed at upload). */
    spectrum: jsonb("spectrum").notNull(),
    status: probeStatus("status").notNull().default("ready"),
    failure: text("failure"),
    /** Settings of the last equilibrium search (starts, tolerances, comparison networks). */
    search: jsonb("search"),
    /** Equilibria of the uploaded matrix found by the last search. */
    result: jsonb("result"),
    /** The same analysis for random networks with the estimated g and τ. */
    comparison: jsonb("comparison"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
  },
  (t) => [index("probes_owner_idx").on(t.ownerId)],
);
