import type { BatchRhs, OdeSystem } from "./types";
import { A, CONTROL, E, ORDER } from "./dopri5-tableau";
import { initialStep } from "./initial-step";

/** Row states of the batched stepper. */
export const ROW = { running: 0, tMax: 1, nonFinite: 2, tooSmall: 3, maxSteps: 4 } as const;

export interface Dopri5Settings {
  rtol: number;
  atol: number;
  tMax: number;
  maxSteps: number;
}

// Module-local copies: imported bindings can compile to property getters (CommonJS interop in
// worker threads), which must stay out of the per-element loops.
const EXPO1 = 1 / ORDER - 0.75 * CONTROL.beta;
const FACC1 = 1 / CONTROL.facMin;
const FACC2 = 1 / CONTROL.facMax;
const BETA = CONTROL.beta;
const SAFETY = CONTROL.safety;
const STAGES: readonly (readonly number[])[] = A.map((row) => [...row]);
const [E1, , E3, E4, E5, E6, E7] = E;
const STAGE_COUNT = 7;

/**
 * A Dormand–Prince 5(4) stepper (Dormand & Prince, J. Comput. Appl. Math. 6 (1980) 19) that
 * advances up to `capacity` independent runs of one autonomous system in lockstep: each run has
 * its own time, step size and PI controller (HNW I §II.4; dopri5.f), but every stage evaluates
 * all active runs together, so a system with `rhsBatch` turns the matrix–vector products of the
 * runs into one matrix–matrix product. Each run's arithmetic is the same as alone (the stages
 * of one row never mix with another), so results do not depend on the batch. Active runs occupy
 * rows 0 … active−1; `remove` moves the last row into the freed one. All buffers are allocated
 * once in the constructor.
 */
export class Dopri5Batch {
  readonly n: number;
  readonly capacity: number;
  active = 0;
  /** States (row-major capacity × n) and F at them (first-same-as-last stage). */
  readonly x: Float64Array;
  readonly f: Float64Array;
  readonly t: Float64Array;
  readonly h: Float64Array;
  readonly ids: Int32Array;
  readonly status: Uint8Array;
  /** 1 when the row's last attempt was accepted. */
  readonly acceptedNow: Uint8Array;
  readonly steps: Float64Array;
  readonly accepted: Float64Array;
  readonly rejected: Float64Array;
  readonly evaluations: Float64Array;
  private readonly k: Float64Array[];
  private readonly ytmp: Float64Array;
  private readonly ynew: Float64Array;
  private readonly facOld: Float64Array;
  private readonly lastRejected: Uint8Array;
  private readonly views = new Map<Float64Array, Float64Array[]>();

  constructor(
    private readonly system: OdeSystem & Partial<BatchRhs>,
    capacity: number,
    private readonly settings: Dopri5Settings,
  ) {
    if (!Number.isSafeInteger(capacity) || capacity < 1) {
      throw new RangeError(`capacity must be a positive integer, got ${capacity}`);
    }
    const n = (this.n = system.n);
    this.capacity = capacity;
    const vec = () => new Float64Array(capacity * n);
    this.x = vec();
    this.f = vec();
    this.ytmp = vec();
    this.ynew = vec();
    this.k = Array.from({ length: STAGE_COUNT - 1 }, vec); // stages 2 … 7
    const num = () => new Float64Array(capacity);
    this.t = num();
    this.h = num();
    this.facOld = num();
    this.steps = num();
    this.accepted = num();
    this.rejected = num();
    this.evaluations = num();
    this.ids = new Int32Array(capacity);
    this.status = new Uint8Array(capacity);
    this.acceptedNow = new Uint8Array(capacity);
    this.lastRejected = new Uint8Array(capacity);
    for (const b of [this.x, this.f, this.ytmp, this.ynew, ...this.k]) this.views.set(b, this.makeViews(b));
  }

  private makeViews(b: Float64Array): Float64Array[] {
    return Array.from({ length: this.capacity }, (_, r) => b.subarray(r * this.n, (r + 1) * this.n));
  }

  /** View of row r of a stepper buffer (x or f). */
  row(buffer: "x" | "f", r: number): Float64Array {
    return this.views.get(this[buffer])![r];
  }

  /**
   * Starts run `id` from x0 at t = 0 in the next free row; evaluates F(x0) and the initial
   * step (HNW I §II.4, "starting step size" algorithm; 2 evaluations).
   * @returns the row index
   * @throws RangeError when the batch is full or x0 has the wrong length
   */
  add(id: number, x0: Float64Array): number {
    if (this.active >= this.capacity) throw new RangeError(`batch is full (capacity ${this.capacity})`);
    if (x0.length !== this.n) throw new RangeError(`x0 must have length ${this.n}, got ${x0.length}`);
    const r = this.active++;
    const xr = this.row("x", r);
    const fr = this.row("f", r);
    xr.set(x0);
    this.system.rhs(xr, fr);
    const { rtol, atol, tMax } = this.settings;
    this.h[r] = initialStep(this.system, xr, fr, rtol, atol, tMax, this.views.get(this.ytmp)![r], this.views.get(this.ynew)![r]);
    this.ids[r] = id;
    this.t[r] = 0;
    this.facOld[r] = 1e-4;
    this.lastRejected[r] = 0;
    this.status[r] = Number.isFinite(this.h[r]) && allFiniteRow(fr) ? ROW.running : ROW.nonFinite;
    this.acceptedNow[r] = 0;
    this.steps[r] = this.accepted[r] = this.rejected[r] = 0;
    this.evaluations[r] = 2;
    return r;
  }

  /**
   * Restarts row r from a new state x at its current time, keeping its step size and controller
   * memory (for a caller that changes the state between steps, as the Lyapunov probe's
   * renormalisation does): re-evaluates F(x) (1 evaluation) and marks the row running when F is
   * finite. The row's tMax is the settings' current tMax (a caller may raise it between calls).
   * @throws RangeError when r is not an active row or x has the wrong length
   */
  restartRow(r: number, x: Float64Array): void {
    if (!Number.isSafeInteger(r) || r < 0 || r >= this.active) throw new RangeError(`r must be an active row, got ${r}`);
    if (x.length !== this.n) throw new RangeError(`x must have length ${this.n}, got ${x.length}`);
    const xr = this.row("x", r);
    const fr = this.row("f", r);
    xr.set(x);
    this.system.rhs(xr, fr);
    this.evaluations[r] += 1;
    this.lastRejected[r] = 0;
    this.acceptedNow[r] = 0;
    this.status[r] = allFiniteRow(fr) ? ROW.running : ROW.nonFinite;
  }

  /**
   * Moves row r forward by dt to a state x computed elsewhere (the Lyapunov probe's end state):
   * restartRow, then t += dt; a row that reaches tMax so ends there (status tMax).
   * @throws RangeError as restartRow, or when dt is not positive and finite
   */
  jumpRow(r: number, x: Float64Array, dt: number): void {
    if (!(dt > 0) || !Number.isFinite(dt)) throw new RangeError(`dt must be positive and finite, got ${dt}`);
    this.restartRow(r, x);
    const tMax = this.settings.tMax;
    this.t[r] = this.t[r] + dt >= tMax ? tMax : this.t[r] + dt;
    if (this.t[r] >= tMax && this.status[r] === ROW.running) this.status[r] = ROW.tMax;
  }

  /** Frees row r by moving the last active row into it. */
  remove(r: number): void {
    const last = --this.active;
    if (r === last) return;
    const n = this.n;
    this.x.copyWithin(r * n, last * n, last * n + n);
    this.f.copyWithin(r * n, last * n, last * n + n);
    for (const a of [this.t, this.h, this.facOld, this.steps, this.accepted, this.rejected, this.evaluations]) a[r] = a[last];
    for (const a of [this.status, this.acceptedNow, this.lastRejected]) a[r] = a[last];
    this.ids[r] = this.ids[last];
  }

  /** One step attempt for every running row; sets acceptedNow and status per row. */
  attempt(): void {
    const m = this.active;
    if (m === 0) return;
    this.prepareSteps(m);
    for (let s = 0; s < STAGE_COUNT - 1; s++) {
      const target = s === STAGE_COUNT - 2 ? this.ynew : this.ytmp;
      this.combine(m, STAGES[s], target);
      this.evaluate(target, this.k[s], m);
    }
    for (let r = 0; r < m; r++) {
      if (this.status[r] !== ROW.running) continue;
      this.evaluations[r] += 6;
      this.steps[r] += 1;
      this.control(r, this.errorNorm(r));
    }
  }

  private prepareSteps(m: number): void {
    const { tMax, maxSteps } = this.settings;
    for (let r = 0; r < m; r++) {
      this.acceptedNow[r] = 0;
      if (this.status[r] !== ROW.running) continue;
      const t = this.t[r];
      let h = this.h[r];
      if (this.steps[r] >= maxSteps) { this.status[r] = ROW.maxSteps; continue; }
      if (t + 1.01 * h >= tMax) h = tMax - t;
      if (h <= 10 * Number.EPSILON * Math.max(1, Math.abs(t))) { this.status[r] = ROW.tooSmall; continue; }
      this.h[r] = h;
    }
  }

  /**
   * target_r = x_r + h_r Σ_j a_j K_j,r over the stages so far (stage 1 is f), summed left to
   * right; one specialised loop per stage count (no inner loop over stages).
   */
  private combine(m: number, a: readonly number[], target: Float64Array): void {
    const n = this.n;
    const { x, f } = this;
    const [k0, k1, k2, k3, k4] = this.k;
    const [a0, a1 = 0, a2 = 0, a3 = 0, a4 = 0, a5 = 0] = a;
    const stages = a.length;
    for (let r = 0; r < m; r++) {
      const base = r * n;
      const end = base + n;
      if (this.status[r] !== ROW.running) {
        target.set(x.subarray(base, end), base); // keep idle rows finite
        continue;
      }
      const h = this.h[r];
      if (stages === 1) for (let i = base; i < end; i++) target[i] = x[i] + h * (a0 * f[i]);
      else if (stages === 2) for (let i = base; i < end; i++) target[i] = x[i] + h * (a0 * f[i] + a1 * k0[i]);
      else if (stages === 3) for (let i = base; i < end; i++) target[i] = x[i] + h * (a0 * f[i] + a1 * k0[i] + a2 * k1[i]);
      else if (stages === 4) {
        for (let i = base; i < end; i++) target[i] = x[i] + h * (a0 * f[i] + a1 * k0[i] + a2 * k1[i] + a3 * k2[i]);
      } else if (stages === 5) {
        for (let i = base; i < end; i++) target[i] = x[i] + h * (a0 * f[i] + a1 * k0[i] + a2 * k1[i] + a3 * k2[i] + a4 * k3[i]);
      } else {
        for (let i = base; i < end; i++) {
          target[i] = x[i] + h * (a0 * f[i] + a1 * k0[i] + a2 * k1[i] + a3 * k2[i] + a4 * k3[i] + a5 * k4[i]);
        }
      }
    }
  }

  private evaluate(input: Float64Array, out: Float64Array, m: number): void {
    if (typeof this.system.rhsBatch === "function") {
      this.system.rhsBatch(input, out, m);
      return;
    }
    const vin = this.views.get(input)!;
    const vout = this.views.get(out)!;
    for (let r = 0; r < m; r++) this.system.rhs(vin[r], vout[r]);
  }

  private errorNorm(r: number): number {
    const { rtol, atol } = this.settings;
    const n = this.n;
    const base = r * n;
    const [, k3, k4, k5, k6, k7] = this.k;
    const { f, x, ynew } = this;
    const h = this.h[r];
    let sum = 0;
    for (let i = base; i < base + n; i++) {
      const e =
        h * (E1 * f[i] + E3 * k3[i] + E4 * k4[i] + E5 * k5[i] + E6 * k6[i] + E7 * k7[i]);
      const sk = atol + rtol * Math.max(Math.abs(x[i]), Math.abs(ynew[i]));
      sum += (e / sk) * (e / sk);
    }
    return Math.sqrt(sum / n);
  }

  /** PI step-size control of dopri5.f (HNW I §II.4); accepts or rejects row r. */
  private control(r: number, err: number): void {
    if (!Number.isFinite(err)) { this.status[r] = ROW.nonFinite; return; }
    const h = this.h[r];
    const fac11 = Math.pow(err, EXPO1);
    if (err <= 1) {
      let fac = fac11 / Math.pow(this.facOld[r], BETA);
      fac = Math.max(FACC2, Math.min(FACC1, fac / SAFETY));
      let hNew = h / fac;
      if (this.lastRejected[r]) hNew = Math.min(hNew, h);
      this.facOld[r] = Math.max(err, 1e-4);
      const n = this.n;
      this.x.set(this.ynew.subarray(r * n, r * n + n), r * n);
      this.f.set(this.k[5].subarray(r * n, r * n + n), r * n);
      this.t[r] = this.t[r] + h >= this.settings.tMax ? this.settings.tMax : this.t[r] + h;
      this.h[r] = hNew;
      this.lastRejected[r] = 0;
      this.acceptedNow[r] = 1;
      this.accepted[r] += 1;
      if (this.t[r] >= this.settings.tMax) this.status[r] = ROW.tMax;
    } else {
      this.h[r] = h / Math.min(FACC1, fac11 / SAFETY);
      this.lastRejected[r] = 1;
      this.rejected[r] += 1;
    }
  }
}

function allFiniteRow(x: Float64Array): boolean {
  for (let i = 0; i < x.length; i++) if (!Number.isFinite(x[i])) return false;
  return true;
}
