import type PgBoss from "pg-boss";
import type { ProbeSearchState, ProbeStats } from "../../shared/schemas/probes";
import type { Db } from "../db/client";
import type { Logger } from "../lib/logger";
import { fromBytes } from "../modules/probes/probe-bytes";
import type { ProbePool } from "../modules/probes/probe.pool";
import { runProbeSearch, type SearchProgress } from "../modules/probes/probe-search";
import { findProbeForSearch, updateSearch } from "../modules/probes/probes.repo";
import { probeSearchPayloadSchema } from "../queue/queues";
import { isPermanentEngineError } from "./compute-pool";

export interface ProbeSearchDeps {
  db: Db;
  pool: ProbePool;
  logger: Logger;
  /** Least milliseconds between two progress writes (default 500). */
  progressIntervalMs?: number;
}

/** What one probe-search job ended with (the job's output, and for tests). */
export type ProbeSearchOutcome = "done" | "failed" | "skipped";

function errorMessage(err: unknown): string {
  return err instanceof Error ? `${err.name}: ${err.message}` : String(err);
}

/** Progress writes, one at a time and at most one per interval; `flush` waits for the last. */
function progressWriter(write: (p: SearchProgress) => Promise<unknown>, intervalMs: number) {
  let chain: Promise<unknown> = Promise.resolve();
  let last = 0;
  return {
    report(p: SearchProgress) {
      if (Date.now() - last < intervalMs) return;
      last = Date.now();
      chain = chain.then(() => write(p)).catch(() => undefined);
    },
    flush: () => chain,
  };
}

/**
 * One probe-search job: parse the payload → skip unless the probe exists and the job's search
 * is its current one → run the search on the probe pool (runProbeSearch), writing progress →
 * store the result (with every equilibrium's state vector), the comparison and status "done".
 * Engine refusals, and any failure of the last attempt, mark the probe failed with the
 * message; other failures are thrown so pg-boss retries the job.
 */
export async function probeSearch(deps: ProbeSearchDeps, job: PgBoss.JobWithMetadata<unknown>): Promise<ProbeSearchOutcome> {
  const parsed = probeSearchPayloadSchema.safeParse(job.data);
  if (!parsed.success) {
    deps.logger.error("probe-search: malformed payload dropped", { issues: parsed.error.issues.map((i) => i.message) });
    return "skipped";
  }
  const { probeId, searchId } = parsed.data;
  const row = await findProbeForSearch(deps.db, probeId);
  const state = row?.search as ProbeSearchState | null | undefined;
  if (!row || state?.id !== searchId || row.status !== "searching") return "skipped";
  const started: ProbeSearchState = { ...state, startedAt: new Date().toISOString(), startsDone: 0, networksDone: 0 };
  await updateSearch(deps.db, probeId, searchId, { search: started });
  const progress = progressWriter((p) => updateSearch(deps.db, probeId, searchId, { search: { ...started, ...p } }), deps.progressIntervalMs ?? 500);
  try {
    const couplings = fromBytes(row.matrix, new Float64Array(new SharedArrayBuffer(row.matrix.length)));
    const facts = { couplings, n: row.n, mu: row.mu, nonlinearity: row.nonlinearity, input: row.input ? fromBytes(row.input) : null, stats: row.stats as ProbeStats };
    const out = await runProbeSearch(deps.pool, facts, state.settings, (p) => progress.report(p));
    await progress.flush();
    const { settings } = state;
    const search: ProbeSearchState = {
      ...started, finishedAt: new Date().toISOString(), startsDone: settings.starts,
      networksDone: out.comparison ? settings.compareNetworks : 0, skippedComparison: out.skippedComparison,
    };
    await updateSearch(deps.db, probeId, searchId, { status: "done", search, result: { ...out.merged.result, states: out.merged.states }, comparison: out.comparison });
    deps.logger.debug("probe-search", { probeId, seconds: out.merged.result.wallSeconds, equilibria: out.merged.result.equilibria.length });
    return "done";
  } catch (err) {
    await progress.flush();
    const last = job.retryCount >= job.retryLimit;
    if (!isPermanentEngineError(err) && !last) throw err;
    await updateSearch(deps.db, probeId, searchId, { status: "failed", failure: errorMessage(err), search: { ...started, finishedAt: new Date().toISOString() } });
    return "failed";
  }
}
