// Worker-thread entry of the engine pool: runs one network of a cell (runNetwork) per task, or
// (named export runRateStarts) one share of the starts of a single rate network; warmWorker
// prepares a thread before timed work (EnginePool.warm).
import type { CellInput } from "../../../shared/schemas/cell-result";
import { runNetwork, type NetworkOutput } from "../cell/run-network";

export interface NetworkTask {
  input: CellInput;
  k: number;
}

export default function runNetworkTask(task: NetworkTask): NetworkOutput {
  return runNetwork(task.input, task.k);
}

export { runRateStarts } from "./starts-task";
export { warmWorker } from "./warm-task";
