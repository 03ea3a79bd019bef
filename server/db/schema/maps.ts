import { sql } from "drizzle-orm";
import {
  boolean, doublePrecision, index, integer, jsonb, pgEnum, pgTable, primaryKey, text, timestamp, uuid,
} from "drizzle-orm/pg-core";
import { groups } from "./groups";
import { users } from "./users";

export const mapVisibility = pgEnum("map_visibility", ["private", "group", "link"]);
export const mapStatus = pgEnum("map_status", ["queued", "running", "done", "cancelled", "failed"]);
export const mapCellState = pgEnum("map_cell_state", ["pending", "done", "failed", "cancelled"]);

/** A sweep: one ensemble, fixed settings, a μ axis and a τ axis, a budget and a base seed. */
export const maps = pgTable(
  "maps",
  {
    id: uuid("id").primaryKey().defaultRandom(),
    ownerId: uuid("owner_id").notNull().references(() => users.id, { onDelete: "cascade" }),
    groupId: uuid("group_id").references(() => groups.id, { onDelete: "set null" }),
    title: text("title").notNull(),
    description: text("description").notNull().default(""),
    visibility: mapVisibility("visibility").notNull().default("private"),
    /** Random token of the read-only link (null when no link exists). */
    shareToken: text("share_token").unique(),
    ensemble: text("ensemble").notNull(),
    ensembleVersion: text("ensemble_version").notNull(),
    settings: jsonb("settings").notNull(),
    muAxis: jsonb("mu_axis").notNull(),
    tauAxis: jsonb("tau_axis").notNull(),
    budget: jsonb("budget").notNull(),
    seed: integer("seed").notNull(),
    status: mapStatus("status").notNull().default("queued"),
    failure: text("failure"),
    cellsTotal: integer("cells_total").notNull(),
    cellsDone: integer("cells_done").notNull().default(0),
    cellsComputed: integer("cells_computed").notNull().default(0),
    cellsFromCache: integer("cells_from_cache").notNull().default(0),
    replicateOf: uuid("replicate_of"),
    createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
    updatedAt: timestamp("updated_at", { withTimezone: true }).notNull().defaultNow(),
    startedAt: timestamp("started_at", { withTimezone: true }),
    finishedAt: timestamp("finished_at", { withTimezone: true }),
  },
  (t) => [index("maps_owner_idx").on(t.ownerId), index("maps_group_idx").on(t.groupId)],
);

/**
 * Stored cell results, one row per cell key (a hash of everything that determines the result).
 * Shared by every map of every account; never deleted with a map.
 */
export const cells = pgTable("cells", {
  key: text("key").primaryKey(),
  ensemble: text("ensemble").notNull(),
  ensembleVersion: text("ensemble_version").notNull(),
  /** The engine's CellInput exactly as computed. */
  input: jsonb("input").notNull(),
  /** The engine's CellResult. */
  result: jsonb("result").notNull(),
  computeSeconds: doublePrecision("compute_seconds").notNull(),
  worker: text("worker").notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

/** Theory columns of one τ row (Kac–Rice eigenvalues are reused across the row's μ values). */
export const theoryRows = pgTable("theory_rows", {
  key: text("key").primaryKey(),
  ensemble: text("ensemble").notNull(),
  tau: doublePrecision("tau").notNull(),
  mus: jsonb("mus").notNull(),
  /** TheoryColumns[] in the order of `mus`. */
  columns: jsonb("columns").notNull(),
  createdAt: timestamp("created_at", { withTimezone: true }).notNull().defaultNow(),
});

/** A map's grid: position (i along μ, j along τ) → cell key and fill state. */
export const mapCells = pgTable(
  "map_cells",
  {
    mapId: uuid("map_id").notNull().references(() => maps.id, { onDelete: "cascade" }),
    i: integer("i").notNull(),
    j: integer("j").notNull(),
    mu: doublePrecision("mu").notNull(),
    tau: doublePrecision("tau").notNull(),
    cellKey: text("cell_key").notNull(),
    theoryKey: text("theory_key").notNull(),
    state: mapCellState("state").notNull().default("pending"),
    fromCache: boolean("from_cache").notNull().default(false),
    jobId: uuid("job_id"),
    failure: text("failure"),
    doneAt: timestamp("done_at", { withTimezone: true }),
  },
  (t) => [
    primaryKey({ columns: [t.mapId, t.i, t.j] }),
    index("map_cells_key_idx").on(t.cellKey),
    index("map_cells_pending_idx").on(t.mapId).where(sql`state = 'pending'`),
  ],
);
