import type { BoundaryRow } from "../../../shared/schemas/review";
import { bootstrapPercentile } from "../../engine/stats/bootstrap";
import { fitLogistic, logisticCrossing, type LogisticFit } from "../../engine/stats/logistic-fit";
import type { PositionCounts } from "./review.repo";

/** Bootstrap settings of every boundary estimate (fixed, so a map's band is reproducible). */
export const BOUNDARY_BOOTSTRAP = Object.freeze({ resamples: 400, seed: 1, level: 0.95 });

export const BOUNDARY_METHOD =
  "μ½: where the share of networks with exactly one stable equilibrium found crosses ½, from a logistic regression " +
  "of that outcome on ln μ over the row's networks, with Firth's penalty so that separated rows keep a finite fit " +
  "(McCullagh & Nelder 1989; Firth 1993). Band: percentile bootstrap over networks, each network resampled with all its " +
  "cells along the row (Efron & Tibshirani 1993), 400 resamples, seed 1.";

/** Predicted lines of one row, from theory (the service supplies them per ensemble). */
export interface RowPrediction {
  predictedMu: number | null;
  predictedMuStable: number | null;
}

/** One done cell of a row: ln μ and the networks' outcomes (1 = exactly one stable equilibrium found). */
interface RowCell {
  mu: number;
  x: number;
  oneStable: Uint8Array;
}

function rowCells(positions: PositionCounts[]): RowCell[] {
  return positions
    .filter((p) => p.state === "done" && p.stableCounts && p.stableCounts.length > 0)
    .map((p) => ({ mu: p.mu, x: Math.log(p.mu), oneStable: Uint8Array.from(p.stableCounts!, (c) => (c === 1 ? 1 : 0)) }))
    .sort((a, b) => a.mu - b.mu);
}

/** Firth fit on the networks listed in `pick` (indices may repeat); null when it fails. */
function fitRow(cells: RowCell[], pick: ArrayLike<number>, start?: readonly [number, number]): LogisticFit | null {
  const successes = cells.map((c) => {
    let s = 0;
    for (let b = 0; b < pick.length; b++) s += c.oneStable[pick[b]];
    return s;
  });
  try {
    return fitLogistic(cells.map((c) => c.x), successes, cells.map(() => pick.length), { method: "firth", start });
  } catch {
    return null; // a degenerate resample (no convergence): the crossing is undefined there
  }
}

/**
 * μ where stable equilibria stop being found, scanning the row's done cells from the largest μ
 * down: muLost is the smallest μ of the top run of cells in which at least one network found a
 * stable equilibrium, and muLostBelow the next grid μ below it, where no network found any. Both
 * are null when stable equilibria were found in every cell of the row (never lost within the
 * range) or not even in the top cell (lost above the range). A grid statement: the true point
 * lies between muLostBelow and muLost, and "found" counts are lower bounds.
 */
export function stableLost(cells: { mu: number; found: boolean }[]): { muLost: number | null; muLostBelow: number | null } {
  const down = [...cells].sort((a, b) => b.mu - a.mu);
  if (down.length === 0 || !down[0].found) return { muLost: null, muLostBelow: null };
  const firstLost = down.findIndex((c) => !c.found);
  if (firstLost < 0) return { muLost: null, muLostBelow: null };
  return { muLost: down[firstLost - 1].mu, muLostBelow: down[firstLost].mu };
}

function emptyRow(j: number, tau: number, status: BoundaryRow["status"], cells: RowCell[], networks: number): Omit<BoundaryRow, keyof RowPrediction | "difference" | "muLost" | "muLostBelow"> {
  return { j, tau, muHalf: null, low: null, high: null, status, networks, cellsUsed: cells.length, resamples: 0, definedResamples: 0 };
}

/**
 * The boundary estimate of one τ row: a Firth logistic fit of "exactly one stable equilibrium
 * found" on ln μ over every network of every done cell, muHalf = exp(−a/b) when the slope is
 * positive and the crossing lies inside the row's μ range; a percentile bootstrap band over
 * networks (a network is one draw shared by all cells of the row, so it is resampled whole);
 * and muLost (stableLost). Status: "crossed", "above-range" / "below-range" (the fitted share
 * stays below / above ½ over the range, or every network agrees), "no-trend" (slope ≤ 0),
 * "too-few" (fewer than two done cells).
 * @param j row index; tau its τ
 * @param positions the row's positions with per-network stable counts
 * @param prediction predicted μ values of the row (theory)
 * @returns the row of GET /api/maps/:id/boundary
 */
export function estimateBoundaryRow(j: number, tau: number, positions: PositionCounts[], prediction: RowPrediction): BoundaryRow {
  const cells = rowCells(positions);
  const networks = cells.length ? Math.min(...cells.map((c) => c.oneStable.length)) : 0;
  const lost = stableLost(positions.filter((p) => p.state === "done" && p.stableCounts).map((p) => ({ mu: p.mu, found: p.stableCounts!.some((c) => c > 0) })));
  const finish = (row: ReturnType<typeof emptyRow>): BoundaryRow => ({
    ...row, ...prediction, ...lost,
    difference: row.muHalf !== null && prediction.predictedMu !== null ? row.muHalf - prediction.predictedMu : null,
  });
  if (cells.length < 2 || networks === 0) return finish(emptyRow(j, tau, "too-few", cells, networks));
  const all = Array.from({ length: networks }, (_, k) => k);
  const ones = cells.reduce((s, c) => s + all.reduce((t, k) => t + c.oneStable[k], 0), 0);
  if (ones === 0) return finish(emptyRow(j, tau, "above-range", cells, networks));
  if (ones === cells.length * networks) return finish(emptyRow(j, tau, "below-range", cells, networks));
  const fit = fitRow(cells, all);
  if (!fit || !(fit.slope > 0)) return finish(emptyRow(j, tau, "no-trend", cells, networks));
  const x = logisticCrossing(fit) as number;
  const [xMin, xMax] = [cells[0].x, cells[cells.length - 1].x];
  if (x < xMin) return finish(emptyRow(j, tau, "below-range", cells, networks));
  if (x > xMax) return finish(emptyRow(j, tau, "above-range", cells, networks));
  const band = bandOf(cells, networks, j, [fit.intercept, fit.slope], xMax - xMin);
  return finish({ ...emptyRow(j, tau, "crossed", cells, networks), muHalf: Math.exp(x), ...band });
}

/**
 * Percentile band of the crossing over network resamples. A resample without a rising fit, or
 * whose crossing lies more than one row width beyond the grid, has no crossing; when more than
 * (1 − level)/2 of the resamples have none, one end of the band is not determined and both
 * bounds are null.
 */
function bandOf(cells: RowCell[], networks: number, j: number, start: readonly [number, number], width: number) {
  const [lo, hi] = [cells[0].x - width, cells[cells.length - 1].x + width];
  const { resamples, seed, level } = BOUNDARY_BOOTSTRAP;
  const band = bootstrapPercentile(
    networks,
    (pick) => {
      const f = fitRow(cells, pick, start);
      const x = f && f.slope > 0 ? logisticCrossing(f) : null;
      return x !== null && x >= lo && x <= hi ? x : null;
    },
    { resamples, seed, level, stream: [j] },
  );
  const determined = resamples - band.defined <= ((1 - level) / 2) * resamples;
  return {
    low: determined && band.lower !== null ? Math.exp(band.lower) : null,
    high: determined && band.upper !== null ? Math.exp(band.upper) : null,
    resamples,
    definedResamples: band.defined,
  };
}
