import { distInf } from "../linalg/vector";

const SPEED_BINS = 8;
const SNAPSHOTS = 200;

/**
 * What a run leaves behind for classification if it never settles: the largest ‖dx/dt‖∞ in
 * each eighth of [0, tMax], and up to 200 evenly spaced snapshots of the state over the second
 * half (allocated only when a run gets there).
 */
export class RunHistory {
  readonly speedMax = new Float64Array(SPEED_BINS);
  private snaps: Float64Array | null = null;
  private count = 0;
  private nextSnap: number;
  private readonly every: number;
  lastSpeed = 0;

  constructor(private readonly n: number, private readonly tMax: number) {
    this.every = tMax / 2 / SNAPSHOTS;
    this.nextSnap = tMax / 2;
  }

  record(t: number, x: Float64Array, speed: number): void {
    const bin = Math.min(SPEED_BINS - 1, Math.floor((t / this.tMax) * SPEED_BINS));
    if (speed > this.speedMax[bin]) this.speedMax[bin] = speed;
    this.lastSpeed = speed;
    if (t < this.nextSnap || this.count >= SNAPSHOTS) return;
    this.snaps ??= new Float64Array(SNAPSHOTS * this.n);
    this.snaps.set(x, this.count * this.n);
    this.count++;
    this.nextSnap += this.every;
  }

  /**
   * Still converging: over the last three eighths of the second half that hold a step, the
   * largest speed fell by more than 10 % from each to the next (‖dx/dt‖ decreasing; a periodic
   * orbit repeats its maxima).
   */
  decreasing(): boolean {
    const seen = Array.from(this.speedMax).filter((v, i) => v > 0 && i >= SPEED_BINS / 2);
    if (seen.length < 3) return false;
    const [a, b, c] = seen.slice(-3);
    return c < 0.9 * b && b < 0.9 * a;
  }

  /**
   * Periodic-looking: the final state x comes back within 10 % of the excursion (plus the
   * distance covered between snapshots) of a snapshot taken at least 10 snapshots earlier,
   * after having moved away from it.
   */
  returns(x: Float64Array): boolean {
    if (!this.snaps || this.count < 20) return false;
    const view = (j: number) => this.snaps!.subarray(j * this.n, (j + 1) * this.n);
    let excursion = 0;
    for (let j = 0; j < this.count; j++) excursion = Math.max(excursion, distInf(x, view(j)));
    if (!(excursion > 0)) return false;
    const slack = 0.1 * excursion + this.lastSpeed * this.every;
    for (let j = 0; j < this.count - 10; j++) {
      if (distInf(x, view(j)) <= slack) return true;
    }
    return false;
  }
}
