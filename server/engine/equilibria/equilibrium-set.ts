import type { Equilibrium } from "./equilibrium";
import { distInf, normInf } from "../linalg/vector";

/** Default relative merge distance: ‖x − y‖∞ ≤ 1e-6 · max(1, ‖x‖∞) means the same point. */
export const DEFAULT_MERGE_TOL = 1e-6;

/**
 * The distinct equilibria of one network found so far, in order of discovery, with hit counts
 * (number of starts that reached each). Two points are the same equilibrium when
 * ‖x − y‖∞ ≤ mergeTol · max(1, ‖x‖∞): Newton-refined points agree to ~1e-12, while distinct
 * equilibria of our ensembles are separated by O(stateScale), so 1e-6 is safe on both sides.
 */
export class EquilibriumSet {
  readonly items: Equilibrium[] = [];
  readonly hits: number[] = [];

  constructor(readonly mergeTol = DEFAULT_MERGE_TOL) {
    if (!(mergeTol > 0) || !Number.isFinite(mergeTol)) {
      throw new RangeError(`mergeTol must be a positive finite number, got ${mergeTol}`);
    }
  }

  /** Index of the stored equilibrium that x merges with, or −1. */
  find(x: Float64Array): number {
    const tol = this.mergeTol * Math.max(1, normInf(x));
    for (let i = 0; i < this.items.length; i++) {
      if (distInf(x, this.items[i].x) <= tol) return i;
    }
    return -1;
  }

  /** Stores a new equilibrium (caller checked find() first) and returns its index. */
  add(e: Equilibrium): number {
    this.items.push(e);
    this.hits.push(0);
    return this.items.length - 1;
  }

  /** Records one start reaching equilibrium i. */
  hit(i: number): void {
    this.hits[i] += 1;
  }

  get size(): number {
    return this.items.length;
  }
}
