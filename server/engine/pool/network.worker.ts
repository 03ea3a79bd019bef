// Worker-thread entry of the engine pool: runs one network of a cell (runNetwork) per task.
import type { CellInput } from "../../../shared/schemas/cell-result";
import { runNetwork, type NetworkOutput } from "../cell/run-network";

export interface NetworkTask {
  input: CellInput;
  k: number;
}

export default function runNetworkTask(task: NetworkTask): NetworkOutput {
  return runNetwork(task.input, task.k);
}
