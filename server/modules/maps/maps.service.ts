import { randomBytes } from "node:crypto";
import { inFlightIssue, limitIssues, type LimitIssue } from "../../../shared/maps/limits";
import { pagePaths } from "../../../shared/schemas/api-paths";
import type { CreateMap, MapEstimate, MapView, UpdateMap } from "../../../shared/schemas/maps";
import type { Db, Tx } from "../../db/client";
import { getEnsemble } from "../../engine/ensembles/registry";
import { requireActor, type Actor } from "../../lib/actor";
import { ConflictError, ForbiddenError, InvalidError, NotFoundError, UnauthenticatedError } from "../../lib/errors";
import type { GroupsService } from "../groups/groups.service";
import type { MapSpec } from "./cell-key";
import { notifyMapEvent } from "../cells/map-notify.repo";
import * as cellsRepo from "./map-cells.repo";
import { accessOf, canWrite, type MapAccess } from "./maps.access";
import { estimateSeconds } from "./maps.estimate";
import type { MapJobs } from "./maps.jobs";
import { planMap, type MapPlan } from "./maps.plan";
import * as repo from "./maps.repo";
import { THROUGHPUT_WINDOW_MINUTES, toMapView } from "./maps.view";

export interface MapsServiceDeps {
  db: Db;
  jobs: MapJobs;
  groups: GroupsService;
  /** Public origin, for share links. */
  appUrl: string;
}

export interface ReadableMap {
  record: repo.MapRecord;
  access: MapAccess;
}

export type CreateMapAnswer = MapEstimate | (MapView & MapEstimate);

type Reader = Actor | null | undefined;

function limitError(issues: LimitIssue[]): InvalidError {
  return new InvalidError(issues.map((i) => i.message).join("; "), issues.map(({ path, message }) => ({ path, message })));
}

function specOf(body: CreateMap): MapSpec {
  return { ensemble: body.ensemble, settings: body.settings, mu: body.mu, tau: body.tau, budget: body.budget, seed: body.seed };
}

/**
 * Maps: creation (limits, cache lookup, positions and jobs in one transaction), access checks,
 * updates, cancel, delete and share links. Reads of grids, cells and exports live in
 * MapReadsService, which uses `getReadable` from here.
 */
export class MapsService {
  constructor(private readonly deps: MapsServiceDeps) {}

  /**
   * The map and the reader's access. Signed out without a token → 401; a map the reader may not
   * see → 404 (whether or not it exists).
   */
  async getReadable(actor: Reader, id: string, token?: string): Promise<ReadableMap> {
    if (!actor && !token) throw new UnauthenticatedError();
    const record = await repo.findMapById(this.deps.db, id, actor?.id ?? null);
    const access = record ? accessOf(record, actor?.id ?? null, token) : null;
    if (!record || !access) throw new NotFoundError("Map not found");
    return { record, access };
  }

  /** Like getReadable for a change: signed out → 401 (a token never writes), read-only → 403. */
  async getWritable(actor: Reader, id: string, token?: string): Promise<ReadableMap & { actor: Actor }> {
    const me = requireActor(actor);
    const readable = await this.getReadable(me, id, token);
    if (!canWrite(readable.access)) throw new ForbiddenError("You can read this map but not change it");
    return { ...readable, actor: me };
  }

  /**
   * Validates limits and group rights, plans every cell; estimateOnly stops after the estimate.
   * `origin.replicateOf` links a replicate to the map it re-runs (review module).
   */
  async create(actor: Reader, body: CreateMap, origin: { replicateOf?: string } = {}): Promise<CreateMapAnswer> {
    const me = requireActor(actor);
    const issues = limitIssues(body, me.siteRole);
    if (issues.length > 0) throw limitError(issues);
    if (body.groupId) await this.deps.groups.requireGroupRole(me, body.groupId, "editor");
    const spec = specOf(body);
    const plan = planMap(spec);
    if (body.estimateOnly) {
      const cached = await cellsRepo.storedCellKeys(this.deps.db, plan.cells.map((c) => c.cellKey));
      return this.estimate(spec, plan, cached);
    }
    const { id, estimate } = await this.deps.db.transaction((tx) => this.insertPlanned(tx, me, body, plan, origin.replicateOf ?? null));
    const { record, access } = await this.getReadable(me, id);
    return { ...toMapView(record, access), ...estimate };
  }

  private estimate(spec: MapSpec, plan: MapPlan, cached: Set<string>): MapEstimate {
    const missing = plan.cells.filter((c) => !cached.has(c.cellKey));
    return { cells: plan.cells.length, cachedCells: plan.cells.length - missing.length, estimatedSeconds: estimateSeconds(spec, missing) };
  }

  /** The map, its positions (cached ones done) and the jobs for the rest, in `tx`. */
  private async insertPlanned(tx: Tx, me: Actor, body: CreateMap, plan: MapPlan, replicateOf: string | null) {
    await repo.lockOwner(tx, me.id);
    const cached = await cellsRepo.storedCellKeys(tx, plan.cells.map((c) => c.cellKey));
    const estimate = this.estimate(specOf(body), plan, cached);
    const allCached = estimate.cachedCells === estimate.cells;
    const busy = allCached ? null : inFlightIssue(await repo.countInFlight(tx, me.id), me.siteRole);
    if (busy) throw limitError([busy]);
    const now = new Date();
    const map = await repo.insertMap(tx, {
      ownerId: me.id, groupId: body.groupId ?? null, title: body.title, description: body.description,
      visibility: body.visibility, ensemble: body.ensemble, ensembleVersion: getEnsemble(body.ensemble).version,
      settings: body.settings, muAxis: body.mu, tauAxis: body.tau, budget: body.budget, seed: body.seed,
      status: allCached ? "done" : "queued", cellsTotal: estimate.cells, cellsDone: estimate.cachedCells,
      cellsFromCache: estimate.cachedCells, startedAt: allCached ? now : null, finishedAt: allCached ? now : null,
      replicateOf,
    });
    const missing = plan.cells.filter((c) => !cached.has(c.cellKey));
    const storedRows = await cellsRepo.storedTheoryKeys(tx, plan.theoryRows.map((t) => t.theoryKey));
    const theoryRows = [...new Map(plan.theoryRows.filter((t) => !storedRows.has(t.theoryKey)).map((t) => [t.theoryKey, t])).values()];
    const { fillCellIds } = await this.deps.jobs.enqueue(tx, {
      fillCells: missing.map((c) => ({ mapId: map.id, i: c.i, j: c.j, cellKey: c.cellKey })),
      fillCellSeconds: missing.map((c) => estimateSeconds(specOf(body), [c])),
      theoryRows,
      mapFinished: allCached ? { mapId: map.id } : undefined,
    });
    const jobOf = new Map(missing.map((c, k) => [`${c.i},${c.j}`, fillCellIds[k]]));
    await cellsRepo.insertMapCells(tx, plan.cells.map((c) => {
      const done = cached.has(c.cellKey);
      return { mapId: map.id, ...c, state: done ? "done" : "pending", fromCache: done, doneAt: done ? now : null, jobId: jobOf.get(`${c.i},${c.j}`) ?? null };
    }));
    return { id: map.id, estimate };
  }

  /** Maps the actor owns or reads through groups. */
  async list(actor: Reader, filter: repo.MapListFilter): Promise<MapView[]> {
    const me = requireActor(actor);
    const rows = await repo.listMaps(this.deps.db, me.id, filter);
    return rows.flatMap((r) => {
      const access = accessOf(r, me.id);
      return access ? [toMapView(r, access)] : [];
    });
  }

  /** One map with its recent throughput and ETA. */
  async get(actor: Reader, id: string, token?: string): Promise<MapView> {
    const { record, access } = await this.getReadable(actor, id, token);
    const running = record.status === "running" || record.status === "queued";
    const recent = running ? await cellsRepo.countComputedSince(this.deps.db, id, THROUGHPUT_WINDOW_MINUTES * 60) : null;
    return toMapView(record, access, recent);
  }

  /** The map a share link opens (signed out or in). */
  async getShared(actor: Reader, token: string): Promise<MapView> {
    const found = await repo.findMapByToken(this.deps.db, token);
    if (!found) throw new NotFoundError("This link does not open any map (it may have been revoked)");
    return this.get(actor, found.id, token);
  }

  /** Title, description, visibility, group. Moving to another group is the owner's. */
  async update(actor: Reader, id: string, body: UpdateMap, token?: string): Promise<MapView> {
    const { record, access, actor: me } = await this.getWritable(actor, id, token);
    const groupId = body.groupId !== undefined ? body.groupId : record.groupId;
    if (groupId !== record.groupId) {
      if (access !== "owner") throw new ForbiddenError("Only the map's owner moves it to another group");
      if (groupId) await this.deps.groups.requireGroupRole(me, groupId, "editor");
    }
    const visibility = body.visibility ?? record.visibility;
    if (visibility === "group" && !groupId) throw new InvalidError("Choose a group for group visibility", [{ path: "groupId", message: "Choose a group for group visibility" }]);
    await repo.updateMap(this.deps.db, id, {
      title: body.title, description: body.description, visibility, groupId,
      ...(visibility === "private" ? { shareToken: null } : {}),
    });
    return this.get(me, id);
  }

  /** Stops queued cells (their jobs are cancelled) and keeps finished ones. */
  async cancel(actor: Reader, id: string, token?: string): Promise<MapView> {
    const { actor: me } = await this.getWritable(actor, id, token);
    await this.deps.db.transaction(async (tx) => {
      const row = await repo.lockMap(tx, id);
      if (!row) throw new NotFoundError("Map not found");
      if (row.status !== "queued" && row.status !== "running") throw new ConflictError(`The map is already ${row.status}`);
      const jobIds = await cellsRepo.cancelPending(tx, id);
      await this.deps.jobs.cancelFillCells(tx, jobIds);
      await repo.updateMap(tx, id, { status: "cancelled", finishedAt: new Date() });
      await notifyMapEvent(tx, { mapId: id, status: "cancelled" });
    });
    return this.get(me, id);
  }

  /** Deletes the map (owner only); stored cells stay in the cache, queued jobs are cancelled. */
  async remove(actor: Reader, id: string, token?: string): Promise<void> {
    const { access } = await this.getWritable(actor, id, token);
    if (access !== "owner") throw new ForbiddenError("Only the map's owner deletes it");
    await this.deps.db.transaction(async (tx) => {
      await repo.lockMap(tx, id);
      await this.deps.jobs.cancelFillCells(tx, await cellsRepo.pendingJobIds(tx, id));
      await repo.deleteMap(tx, id);
    });
  }

  /** A read-only link (the existing one when there is one); a private map becomes "link". */
  async share(actor: Reader, id: string, token?: string): Promise<{ token: string; url: string }> {
    const { record } = await this.getWritable(actor, id, token);
    const shareToken = record.shareToken ?? randomBytes(24).toString("base64url");
    await repo.updateMap(this.deps.db, id, { shareToken, visibility: record.visibility === "private" ? "link" : record.visibility });
    return { token: shareToken, url: `${this.deps.appUrl}${pagePaths.sharedMap(shareToken)}` };
  }

  /** Revokes the link; a "link" map falls back to its group's visibility, or private. */
  async unshare(actor: Reader, id: string, token?: string): Promise<MapView> {
    const { record, actor: me } = await this.getWritable(actor, id, token);
    const visibility = record.visibility === "link" ? (record.groupId ? "group" : "private") : record.visibility;
    await repo.updateMap(this.deps.db, id, { shareToken: null, visibility });
    return this.get(me, id);
  }
}

export function createMapsService(deps: MapsServiceDeps): MapsService {
  return new MapsService(deps);
}
