// Type declarations for odex 2.0.4 (it ships none). Hairer's ODEX extrapolation solver.
// Checked against node_modules/odex/src/odex.ts (2.0.4): members, defaults and Solution fields match.
declare module "odex" {
  export type Derivative = (x: number, y: number[]) => number[];
  export type OutputFunction = (
    nr: number, xold: number, x: number, y: number[], dense?: (c: number, x: number) => number,
  ) => boolean | void;
  export enum Outcome { Converged = 0, MaxStepsExceeded = 1, EarlyReturn = 2 }
  export interface Solution { y: number[]; outcome: Outcome; nStep: number; xEnd: number; nAccept: number; nReject: number; nEval: number }
  export class Solver {
    constructor(n: number);
    n: number; uRound: number; maxSteps: number; initialStepSize: number; maxStepSize: number;
    maxExtrapolationColumns: number; stepSizeSequence: number; stabilityCheckCount: number;
    stabilityCheckTableLines: number; denseOutput: boolean; denseOutputErrorEstimator: boolean;
    denseComponents: number[] | undefined; interpolationFormulaDegree: number;
    stepSizeReductionFactor: number; stepSizeFac1: number; stepSizeFac2: number;
    stepSizeFac3: number; stepSizeFac4: number; stepSafetyFactor1: number; stepSafetyFactor2: number;
    relativeTolerance: number | number[]; absoluteTolerance: number | number[]; debug: boolean;
    solve(f: Derivative, x: number, y0: number[], xEnd: number, solOut?: OutputFunction): Solution;
    /** The 1-based step-number sequence nSeq ∈ 1 … 5 of length n (index 0 unused). */
    static stepSizeSequence(nSeq: number, n: number): number[];
    grid(dt: number, out: (x: number, y: number[]) => void): OutputFunction;
  }
}
