import { Dopri5Batch, ROW, type Dopri5Settings } from "./dopri5-batch";
import type { BatchRhs, IntegrationResult, IntegrationStatus, OdeSystem } from "./types";

const STATUS_OF_ROW: Record<number, IntegrationStatus> = {
  [ROW.tMax]: "reached-tmax",
  [ROW.nonFinite]: "non-finite",
  [ROW.tooSmall]: "step-too-small",
  [ROW.maxSteps]: "max-steps",
};

export interface IntegrateManyOptions extends Dopri5Settings {
  /** Runs advanced together (rows of the batch). */
  capacity: number;
}

/** Move a run to state x at time t + dt (its step size kept; Dopri5Batch.jumpRow). */
export interface RunJump {
  x: Float64Array;
  dt: number;
}

/** Callbacks of integrateMany, each given the run's id (0 … count−1). */
export interface ManyRunCallbacks {
  /** Start state of run id (read once, when the run enters the batch). */
  start(id: number): Float64Array;
  /**
   * After each accepted step of run id; return true to stop it, or a RunJump to move it to a
   * state computed elsewhere. Views valid during the call.
   */
  onStep?(id: number, t: number, x: Float64Array, dxdt: Float64Array): boolean | void | RunJump;
  /** When run id ends, with its final state and counters. */
  onEnd(id: number, result: IntegrationResult): void;
}

/**
 * Integrates `count` runs of one system with the batched Dormand–Prince 5(4) stepper
 * (Dopri5Batch): runs enter in id order as rows free up, and a run's end is reported in a fixed
 * order (descending row within a step round), so the whole sequence of callbacks is a pure
 * function of the inputs and `capacity`.
 * @param system the ODE (uses rhsBatch when present)
 * @param count number of runs
 * @param callbacks start states, observer and end handler
 * @param options tolerances, tMax, maxSteps per run, and batch capacity
 * @throws RangeError on a bad count or capacity
 */
export function integrateMany(
  system: OdeSystem & Partial<BatchRhs>,
  count: number,
  callbacks: ManyRunCallbacks,
  options: IntegrateManyOptions,
): void {
  if (!Number.isSafeInteger(count) || count < 0) throw new RangeError(`count must be a non-negative integer, got ${count}`);
  const batch = new Dopri5Batch(system, Math.max(1, Math.min(options.capacity, count)), options);
  const stopped = new Uint8Array(batch.capacity);
  let next = 0;
  const fill = () => {
    while (batch.active < batch.capacity && next < count) {
      const r = batch.add(next, callbacks.start(next));
      stopped[r] = 0;
      next++;
    }
  };
  fill();
  while (batch.active > 0) {
    batch.attempt();
    for (let r = 0; r < batch.active; r++) {
      if (!batch.acceptedNow[r] || !callbacks.onStep) continue;
      const next = callbacks.onStep(batch.ids[r], batch.t[r], batch.row("x", r), batch.row("f", r));
      if (next === true) stopped[r] = 1;
      else if (next) batch.jumpRow(r, next.x, next.dt);
    }
    for (let r = batch.active - 1; r >= 0; r--) {
      if (!stopped[r] && batch.status[r] === ROW.running) continue;
      const status = stopped[r] ? "stopped" : STATUS_OF_ROW[batch.status[r]];
      callbacks.onEnd(batch.ids[r], resultOfRow(batch, r, status));
      const last = batch.active - 1;
      batch.remove(r);
      stopped[r] = stopped[last];
    }
    fill();
  }
}

function resultOfRow(batch: Dopri5Batch, r: number, status: IntegrationStatus): IntegrationResult {
  return {
    x: Float64Array.from(batch.row("x", r)),
    t: batch.t[r],
    status,
    counters: {
      steps: batch.steps[r],
      accepted: batch.accepted[r],
      rejected: batch.rejected[r],
      evaluations: batch.evaluations[r],
    },
  };
}
