import { budgetSchema, type CreateMap, type MapView } from "../../../shared/schemas/maps";
import { getEnsemble } from "../../engine/ensembles/registry";
import { iso } from "../../lib/dto";
import type { MapAccess } from "./maps.access";
import type { MapRecord, MapRow } from "./maps.repo";

type Axis = MapView["mu"];

/** Minutes over which the recent throughput is measured. */
export const THROUGHPUT_WINDOW_MINUTES = 5;

function axis(value: unknown): Axis {
  const a = value as Partial<Axis>;
  return { min: Number(a.min), max: Number(a.max), steps: Number(a.steps), scale: a.scale ?? "linear" };
}

function muCritical(row: MapRow): number | null {
  try {
    return getEnsemble(row.ensemble).muCritical(row.settings);
  } catch {
    return null; // an ensemble removed since the map was made: no scale to show
  }
}

/**
 * Cells per minute: over the last THROUGHPUT_WINDOW_MINUTES when cells were computed then
 * (`recent`), else over the whole computing time (cellsComputed since started_at); null before
 * any computed cell.
 */
export function throughputOf(row: MapRow, recent: number | null, now = Date.now()): number | null {
  if (!row.startedAt || row.cellsComputed === 0) return null;
  const end = row.finishedAt?.getTime() ?? now;
  const minutes = Math.max((end - row.startedAt.getTime()) / 60_000, 1 / 60);
  if (recent && recent > 0 && !row.finishedAt) return recent / Math.min(THROUGHPUT_WINDOW_MINUTES, minutes);
  return row.cellsComputed / minutes;
}

/** Seconds until every cell is done at this throughput (0 when done, null when unknown or stopped). */
export function etaOf(row: MapRow, throughput: number | null): number | null {
  if (row.status === "done") return 0;
  if (row.status !== "queued" && row.status !== "running") return null;
  if (!throughput || throughput <= 0) return null;
  return Math.round(((row.cellsTotal - row.cellsDone) / throughput) * 60);
}

/** The API view of a map for a reader with `access` (`recent`: cells computed in the window). */
export function toMapView(rec: MapRecord, access: MapAccess, recent: number | null = null): MapView {
  const throughput = throughputOf(rec, recent);
  return {
    id: rec.id,
    title: rec.title,
    description: rec.description,
    ownerId: rec.ownerId,
    ownerName: rec.ownerName,
    groupId: rec.groupId,
    groupName: rec.groupName,
    visibility: rec.visibility,
    shareToken: access === "owner" || access === "editor" ? rec.shareToken : null,
    access,
    ensemble: rec.ensemble as MapView["ensemble"],
    ensembleVersion: rec.ensembleVersion,
    settings: rec.settings as Record<string, unknown>,
    mu: axis(rec.muAxis),
    tau: axis(rec.tauAxis),
    budget: budgetSchema.parse(rec.budget),
    seed: rec.seed,
    muCritical: muCritical(rec),
    status: rec.status,
    failure: rec.failure,
    cellsTotal: rec.cellsTotal,
    cellsDone: rec.cellsDone,
    cellsComputed: rec.cellsComputed,
    cellsFromCache: rec.cellsFromCache,
    throughput: throughput === null ? null : Math.round(throughput * 100) / 100,
    etaSeconds: etaOf(rec, throughput),
    replicateOf: rec.replicateOf,
    createdAt: iso(rec.createdAt),
    startedAt: rec.startedAt ? iso(rec.startedAt) : null,
    finishedAt: rec.finishedAt ? iso(rec.finishedAt) : null,
  };
}

/** The create body that recreates the map (embedded in exports). */
export function manifestOf(row: MapRow): CreateMap {
  return {
    title: row.title,
    description: row.description,
    ensemble: row.ensemble,
    settings: row.settings,
    mu: axis(row.muAxis),
    tau: axis(row.tauAxis),
    budget: budgetSchema.parse(row.budget),
    seed: row.seed,
    // A deleted group leaves a group-visible map without its group: recreate it private.
    visibility: row.visibility === "group" && !row.groupId ? "private" : row.visibility,
    groupId: row.groupId,
  } as CreateMap;
}
