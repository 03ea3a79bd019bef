// Worker-thread entry of the map workers' pool: one whole cell (runCell) or one theory row
// (theoryColumnsRow) per task, so each core works on its own cell.
import type { CellInput, CellResult } from "../../../shared/schemas/cell-result";
import type { TheoryColumns } from "../../../shared/schemas/theory";
import { runCell } from "../cell/run-cell";
import { theoryColumnsRow, type TheoryRowInput } from "../kac-rice/columns";

export type MapTask = { kind: "cell"; input: CellInput } | { kind: "theory-row"; input: TheoryRowInput };
export type MapTaskResult = { kind: "cell"; result: CellResult } | { kind: "theory-row"; columns: TheoryColumns[] };

/**
 * Runs one map task in a worker thread.
 * @param task a cell input (runCell) or a theory row input (theoryColumnsRow)
 * @returns the cell result or the row's theory columns
 * @throws TypeError on an unknown task kind; the engine's TypeError/RangeError on bad input
 */
export default function runMapTask(task: MapTask): MapTaskResult {
  if (task?.kind === "cell") return { kind: "cell", result: runCell(task.input) };
  if (task?.kind === "theory-row") return { kind: "theory-row", columns: theoryColumnsRow(task.input) };
  throw new TypeError(`task.kind must be "cell" or "theory-row", got ${String((task as { kind?: unknown } | null)?.kind)}`);
}
