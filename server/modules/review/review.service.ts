import { randomInt } from "node:crypto";
import { axisPoints, createMapSchema, type CreateMap } from "../../../shared/schemas/maps";
import type { ImportMap, MapBoundary, MapComparison, MapReport, ReplicateBody } from "../../../shared/schemas/review";
import { mStable, originStabilityMu } from "../../../shared/theory/index";
import type { Db } from "../../db/client";
import { getEnsemble } from "../../engine/ensembles/registry";
import { requireActor, type Actor } from "../../lib/actor";
import { AppError, InvalidError } from "../../lib/errors";
import type { CreateMapAnswer, MapsService, ReadableMap } from "../maps/maps.service";
import { manifestOf } from "../maps/maps.view";
import { readAbout } from "./about";
import { BOUNDARY_BOOTSTRAP, BOUNDARY_METHOD, estimateBoundaryRow, type RowPrediction } from "./boundary";
import { compareGrids, differingSettings } from "./compare";
import { ENGINE_SETTINGS } from "./engine-settings";
import * as repo from "./review.repo";

type Reader = Actor | null | undefined;
type Axis = { min: number; max: number; steps: number; scale?: "linear" | "log" };

const MAX_TITLE = 120;

function sameAxis(a: number[], b: number[]): boolean {
  return a.length === b.length && a.every((v, k) => Math.abs(v - b[k]) <= 1e-9 * Math.max(1, Math.abs(v)));
}

/** A random base seed other than `old`. */
function freshSeed(old: number): number {
  const seed = randomInt(0, 2 ** 31 - 1);
  return seed === old ? (seed + 1) % (2 ** 31 - 1) : seed;
}

/** Predicted μ lines of a τ row: field m = 1 and m_st(τ); rate the origin line μ = g(1+τ). */
function predictionFor(ensemble: string, settings: Record<string, unknown>, tau: number): RowPrediction {
  if (ensemble === "field") {
    const muC = getEnsemble("field").muCritical(settings) as number;
    return { predictedMu: muC, predictedMuStable: muC * mStable(tau) };
  }
  if (ensemble === "rate") return { predictedMu: originStabilityMu(Number(settings.g), tau), predictedMuStable: null };
  return { predictedMu: null, predictedMuStable: null };
}

function ref(m: ReadableMap) {
  const r = m.record;
  return { id: r.id, title: r.title, seed: r.seed, status: r.status, ensemble: r.ensemble, settings: r.settings as Record<string, unknown> };
}

/**
 * Review of maps: replicates (the same manifest with a new seed, linked by replicate_of),
 * cell-by-cell comparison, boundary estimates, imports of manifests and the report's facts.
 * Access rules are the maps service's: reads through getReadable, replication through
 * getWritable (an editor's action), imports as a new map of the importer.
 */
export class ReviewService {
  constructor(private readonly deps: { db: Db; maps: MapsService }) {}

  /** Re-runs a map with another base seed (random when not given) as a new map of the actor. */
  async replicate(actor: Reader, id: string, body: ReplicateBody, token?: string): Promise<CreateMapAnswer> {
    const { record, actor: me } = await this.deps.maps.getWritable(actor, id, token);
    const seed = body.seed ?? freshSeed(record.seed);
    const manifest = manifestOf(record);
    // The group keeps reading the replicate; a read-only link is not copied (share it anew).
    const group = manifest.visibility !== "private" && manifest.groupId ? { visibility: "group" as const, groupId: manifest.groupId } : { visibility: "private" as const, groupId: null };
    const title = body.title ?? `${record.title} · replicate, seed ${seed}`.slice(0, MAX_TITLE);
    const next = createMapSchema.parse({ ...manifest, ...group, title, seed, estimateOnly: undefined });
    return this.deps.maps.create(me, next, { replicateOf: record.id });
  }

  /** Recreates a map from an export's manifest; identical cells come from the cache. */
  async importMap(actor: Reader, body: ImportMap): Promise<CreateMapAnswer> {
    const me = requireActor(actor);
    const manifest: CreateMap = { ...body.manifest, title: body.title ?? body.manifest.title };
    return this.deps.maps.create(me, manifest);
  }

  /** Per-cell comparison of two maps with the same μ and τ axes (else 422). */
  async compare(actor: Reader, id: string, otherId: string, token?: string, otherToken?: string): Promise<MapComparison> {
    const a = await this.deps.maps.getReadable(actor, id, token);
    const b = await this.deps.maps.getReadable(actor, otherId, otherToken);
    const mu = axisPoints(a.record.muAxis as Axis);
    const tau = axisPoints(a.record.tauAxis as Axis);
    const issues = [];
    if (!sameAxis(mu, axisPoints(b.record.muAxis as Axis))) issues.push({ path: "otherId", message: "The maps' μ axes differ: compare maps with the same grid" });
    if (!sameAxis(tau, axisPoints(b.record.tauAxis as Axis))) issues.push({ path: "otherId", message: "The maps' τ axes differ: compare maps with the same grid" });
    if (issues.length) throw new InvalidError(issues.map((i) => i.message).join("; "), issues);
    const [pa, pb] = await Promise.all([repo.listPositionCounts(this.deps.db, id), repo.listPositionCounts(this.deps.db, otherId)]);
    const grid = compareGrids(pa, pb);
    const differing = differingSettings(manifestOf(a.record) as unknown as Record<string, unknown>, manifestOf(b.record) as unknown as Record<string, unknown>);
    return { a: ref(a), b: ref(b), mu, tau, level: grid.level, cells: grid.cells, summary: { ...grid.summary, differingSettings: differing } };
  }

  /** Boundary estimate per τ row (see boundary.ts), beside the predicted lines. */
  async boundary(actor: Reader, id: string, token?: string): Promise<MapBoundary> {
    const { record } = await this.deps.maps.getReadable(actor, id, token);
    const positions = await repo.listPositionCounts(this.deps.db, id);
    const taus = axisPoints(record.tauAxis as Axis);
    const settings = record.settings as Record<string, unknown>;
    const rows = taus.map((tau, j) => estimateBoundaryRow(j, tau, positions.filter((p) => p.j === j), predictionFor(record.ensemble, settings, tau)));
    return { mapId: id, ensemble: record.ensemble, method: BOUNDARY_METHOD, level: BOUNDARY_BOOTSTRAP.level, resamples: BOUNDARY_BOOTSTRAP.resamples, seed: BOUNDARY_BOOTSTRAP.seed, rows };
  }

  /** What the printed report states beyond the map: software, compute time, engine settings, replicates. */
  async report(actor: Reader, id: string, token?: string): Promise<MapReport> {
    const map = await this.deps.maps.get(actor, id, token);
    const totals = await repo.computeTotals(this.deps.db, id);
    const links = await repo.relatedMapIds(this.deps.db, id, map.replicateOf);
    const related: MapReport["related"] = [];
    for (const link of links) {
      const readable = await this.readableOrNull(actor, link.id);
      if (!readable) continue;
      const relation = link.id === map.replicateOf ? "original" : link.replicateOf === id ? "replicate" : "sibling";
      related.push({ id: link.id, title: readable.record.title, seed: readable.record.seed, status: readable.record.status, relation });
    }
    return { map, about: readAbout(), computeSeconds: totals.seconds, cellsStored: totals.stored, engineSettings: ENGINE_SETTINGS, related, generatedAt: new Date().toISOString() };
  }

  private async readableOrNull(actor: Reader, id: string): Promise<ReadableMap | null> {
    try {
      return await this.deps.maps.getReadable(actor, id);
    } catch (err) {
      if (err instanceof AppError) return null;
      throw err;
    }
  }
}

export function createReviewService(deps: { db: Db; maps: MapsService }): ReviewService {
  return new ReviewService(deps);
}
