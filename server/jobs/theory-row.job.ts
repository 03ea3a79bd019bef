import type { Db } from "../db/client";
import type { Logger } from "../lib/logger";
import { hasTheoryRow } from "../modules/cells/cells.repo";
import type { CellsService } from "../modules/cells/cells.service";
import { theoryKey } from "../modules/maps/cell-key";
import { theoryRowPayloadSchema } from "../queue/queues";
import { isPermanentEngineError, type ComputePool } from "./compute-pool";

export interface TheoryRowDeps {
  db: Db;
  cells: CellsService;
  compute: ComputePool;
  logger: Logger;
}

export type TheoryRowOutcome = "computed" | "cached" | "raced" | "skipped";

/**
 * One theory-row job: parse the payload → check its key names its content → skip when the row
 * is stored → compute the τ row's theory columns in the pool (theoryColumnsRow; the finite-N
 * Kac–Rice matrices are shared by the row's μ values) → store once and notify. The engine
 * refusing the input is logged and the row left empty (cells show no theory); other errors are
 * thrown so pg-boss retries.
 */
export async function computeTheoryRow(deps: TheoryRowDeps, data: unknown): Promise<TheoryRowOutcome> {
  const parsed = theoryRowPayloadSchema.safeParse(data);
  if (!parsed.success) {
    deps.logger.error("theory-row: malformed payload dropped", { issues: parsed.error.issues.map((i) => i.message) });
    return "skipped";
  }
  const p = parsed.data;
  const { theoryKey: key, ...body } = p;
  if (theoryKey(body) !== key) {
    deps.logger.error("theory-row: key does not match the payload (another theory version?)", { theoryKey: key });
    return "skipped";
  }
  if (await hasTheoryRow(deps.db, key)) return "cached";
  let columns;
  try {
    columns = await deps.compute.runTheoryRow({ ensemble: p.ensemble, params: p.params, mus: p.mus, tau: p.tau, kacRice: p.kacRice });
  } catch (err) {
    if (!isPermanentEngineError(err)) throw err;
    deps.logger.error("theory-row: the engine refused the row", { theoryKey: key, message: (err as Error).message });
    return "skipped";
  }
  return (await deps.cells.recordTheoryRow(p, columns)) ? "computed" : "raced";
}
