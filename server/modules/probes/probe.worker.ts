// Worker-thread entry of the probe pool: the spectrum of an uploaded matrix, a chunk of the
// search's starts on it, or one comparison network (runNetwork), one task per thread.
import type { CellInput } from "../../../shared/schemas/cell-result";
import { runNetwork, type NetworkOutput } from "../../engine/cell/run-network";
import { eigenvalues } from "../../engine/spectra/eigenvalues";
import { runStartsChunk, type StartsChunkResult, type StartsChunkTask } from "./analysis/search-chunk";

export type ProbeTask =
  | { kind: "spectrum"; couplings: Float64Array; n: number }
  | { kind: "starts"; task: StartsChunkTask }
  | { kind: "network"; input: CellInput; k: number };

export type ProbeTaskResult =
  | { kind: "spectrum"; re: number[]; im: number[] }
  | { kind: "starts"; chunk: StartsChunkResult }
  | { kind: "network"; output: NetworkOutput };

/**
 * Runs one probe task.
 * @throws TypeError on an unknown kind; the engine's TypeError/RangeError on bad input
 */
export default function runProbeTask(task: ProbeTask): ProbeTaskResult {
  switch (task?.kind) {
    case "spectrum": {
      const s = eigenvalues(task.couplings, task.n);
      return { kind: "spectrum", re: Array.from(s.re), im: Array.from(s.im) };
    }
    case "starts":
      return { kind: "starts", chunk: runStartsChunk(task.task) };
    case "network":
      return { kind: "network", output: runNetwork(task.input, task.k) };
    default:
      throw new TypeError(`task.kind must be "spectrum", "starts" or "network", got ${String((task as { kind?: unknown } | null)?.kind)}`);
  }
}
