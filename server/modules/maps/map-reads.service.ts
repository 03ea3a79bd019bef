import { summarizeCell, type CellSummary } from "../../../shared/maps/cell-summary";
import { layerValue, type LayerId } from "../../../shared/maps/layers";
import type { CellResult } from "../../../shared/schemas/cell-result";
import { axisPoints, type MapCellDetail, type MapExport, type MapGrid } from "../../../shared/schemas/maps";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import type { Db } from "../../db/client";
import { ENGINE_VERSION } from "../../engine/cell/cell-input";
import type { Actor } from "../../lib/actor";
import { getEnsemble } from "../../engine/ensembles/registry";
import { InvalidError, NotFoundError } from "../../lib/errors";
import { cellInputFor, mapSpecFromRow } from "./cell-key";
import { listCellSummaries } from "../cells/cell-summaries.repo";
import * as cellsRepo from "./map-cells.repo";
import { mapCsv } from "./maps.export";
import type { MapRecord } from "./maps.repo";
import type { MapsService } from "./maps.service";
import { manifestOf } from "./maps.view";

type Reader = Actor | null | undefined;
type TheoryRows = Awaited<ReturnType<typeof cellsRepo.findTheoryRows>>;

function budgetCounts(rec: MapRecord): { networks: number; starts: number } {
  const b = rec.budget as { networks: number; starts: number };
  return { networks: b.networks, starts: b.starts };
}

/** The theory columns at μ index i of a τ row (null until the row is stored). */
function theoryAt(rows: TheoryRows, key: string, i: number): TheoryColumns | null {
  return rows.get(key)?.columns[i] ?? null;
}

/** Grids, single cells and exports of a map; access through MapsService.getReadable. */
export class MapReadsService {
  constructor(private readonly deps: { db: Db; maps: MapsService }) {}

  /**
   * Summaries of every position, ordered by j then i (results only where the position is done),
   * and the engine version of the stored results (the running engine's when none is stored yet).
   */
  private async summaries(rec: MapRecord): Promise<{ engineVersion: string; cells: Array<CellSummary & { cellKey: string }> }> {
    const rows = await listCellSummaries(this.deps.db, rec.id);
    const engineVersion = rows.find((r) => r.engineVersion)?.engineVersion ?? ENGINE_VERSION;
    return { engineVersion, cells: rows.map((r) => ({ ...r.summary, cellKey: r.cellKey })) };
  }

  /** One layer over the grid: values[j][i], with every position's summary. */
  async grid(actor: Reader, id: string, layer: LayerId, token?: string): Promise<MapGrid> {
    const { record } = await this.deps.maps.getReadable(actor, id, token);
    const mu = axisPoints(record.muAxis as Parameters<typeof axisPoints>[0]);
    const tau = axisPoints(record.tauAxis as Parameters<typeof axisPoints>[0]);
    const values: (number | null)[][] = tau.map(() => mu.map(() => null));
    const cells = (await listCellSummaries(this.deps.db, record.id)).map((r) => r.summary);
    for (const c of cells) values[c.j][c.i] = layerValue(layer, c);
    return { layer, mu, tau, values, cells };
  }

  /** One position: summary, full result, theory columns, cell key. */
  async cell(actor: Reader, id: string, i: number, j: number, token?: string): Promise<MapCellDetail> {
    const { record } = await this.deps.maps.getReadable(actor, id, token);
    const p = await cellsRepo.findPosition(this.deps.db, id, i, j);
    if (!p) throw new NotFoundError(`No cell (${i}, ${j}) in this map`);
    const rows = await cellsRepo.findTheoryRows(this.deps.db, [p.theoryKey]);
    const theory = theoryAt(rows, p.theoryKey, p.i);
    const result: CellResult | null = p.state === "done" ? p.result : null;
    const pos = { i: p.i, j: p.j, mu: p.mu, tau: p.tau, state: p.state, fromCache: p.fromCache, ...budgetCounts(record) };
    return { summary: summarizeCell(pos, result, theory), result, theory, cellKey: p.cellKey, fromCache: p.fromCache };
  }

  /**
   * Coupling matrix J of network k at grid position (i, j), regenerated from the common random
   * numbers exactly as the engine drew it (ensemble draw for (seed, k, N), then reweighted at
   * the cell's τ). Ensembles without a coupling matrix (the field network) answer 422.
   */
  async couplings(actor: Reader, id: string, i: number, j: number, k: number, token?: string): Promise<{ title: string; n: number; data: Float64Array }> {
    const { record } = await this.deps.maps.getReadable(actor, id, token);
    const spec = mapSpecFromRow(record);
    if (i >= spec.mu.steps || j >= spec.tau.steps) throw new NotFoundError(`No cell (${i}, ${j}) in this map`);
    if (k >= spec.budget.networks) throw new NotFoundError(`This map has ${spec.budget.networks} networks per cell (0 to ${spec.budget.networks - 1})`);
    const input = cellInputFor(spec, i, j);
    const ensemble = getEnsemble(input.ensemble);
    if (!ensemble.couplings) {
      throw new InvalidError(`The ${ensemble.label} has no coupling matrix to download`, [{ path: "k", message: "No coupling matrix for this ensemble" }]);
    }
    const n = ensemble.dimension(input.params);
    const data = ensemble.couplings(input.params, ensemble.draw(input.params, input.seed, k), input.mu, input.tau);
    if (!data) throw new InvalidError("This network has no coupling matrix to download");
    return { title: `${record.title} cell ${i}-${j} network ${k}`, n, data };
  }

  /** JSON export: the manifest that recreates the map, versions, every cell's summary and key. */
  async exportJson(actor: Reader, id: string, token?: string): Promise<{ title: string; body: MapExport }> {
    const { record } = await this.deps.maps.getReadable(actor, id, token);
    const { engineVersion, cells } = await this.summaries(record);
    const body: MapExport = {
      manifest: manifestOf(record) as unknown as Record<string, unknown>,
      engineVersion,
      ensembleVersion: record.ensembleVersion,
      exportedAt: new Date().toISOString(),
      cells,
    };
    return { title: record.title, body };
  }

  /** CSV export (see maps.export.ts). */
  async exportCsv(actor: Reader, id: string, token?: string): Promise<{ title: string; text: string }> {
    const { record } = await this.deps.maps.getReadable(actor, id, token);
    const { engineVersion, cells } = await this.summaries(record);
    const meta = { manifest: manifestOf(record), engineVersion, ensembleVersion: record.ensembleVersion, exportedAt: new Date().toISOString() };
    return { title: record.title, text: mapCsv(meta, cells) };
  }
}

export function createMapReadsService(deps: { db: Db; maps: MapsService }): MapReadsService {
  return new MapReadsService(deps);
}
