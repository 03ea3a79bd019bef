/**
 * The one interface every ensemble implements. The sweep machinery (cell runner, maps, workers)
 * knows only this interface, so a new ensemble is one new module registered in `registry.ts`.
 *
 * Common random numbers: `draw(params, seed, k)` depends only on (base seed, network index k,
 * N, ensemble id) — never on μ or τ — and `build(params, draws, mu, tau)` only reweights those
 * draws, so network k varies smoothly across the whole (μ, τ) grid.
 */
export interface Network {
  /** Dimension N of the state. */
  readonly n: number;
  /** Relaxation rate μ > 0 this network was built with. */
  readonly mu: number;
  /** Writes dx/dt = F(x) into `out` (caller-owned, length n). Must not allocate. */
  rhs(x: Float64Array, out: Float64Array): void;
  /** Writes the Jacobian ∂F_i/∂x_j at x into `out`, row-major (index i*n + j), length n*n. */
  jacobian(x: Float64Array, out: Float64Array): void;
  /** Floating-point operations per `rhs` call (for benchmark GFLOP/s figures). */
  readonly rhsFlops: number;
  /**
   * Typical magnitude of one state component at equilibria (each ensemble documents its
   * formula), used to draw random starts and to judge escape.
   */
  readonly stateScale: number;
}

export interface Ensemble<P, D> {
  /** Stable identifier stored in cell keys: "rate", "field", … */
  readonly id: string;
  /** Bump when a change alters results; it is part of every cell's cache key. */
  readonly version: string;
  /** Human name for the interface. */
  readonly label: string;
  /** Checks parameters; throws RangeError/TypeError naming the parameter and value. */
  validate(params: P): P;
  /** Dimension of the state for these parameters. */
  dimension(params: P): number;
  /** Common random numbers of network k (depend on seed, k, N and the ensemble only). */
  draw(params: P, seed: number, k: number): D;
  /** The network at (μ, τ) from its draws. */
  build(params: P, draws: D, mu: number, tau: number): Network;
  /**
   * Critical relaxation rate μ_c for these parameters (the scale of m = μ/μ_c), or null when the
   * ensemble has no such closed-form scale.
   */
  muCritical(params: P): number | null;
  /** A coupling matrix to export for network k at (μ, τ), row-major n×n, when the ensemble has one. */
  couplings?(params: P, draws: D, mu: number, tau: number): Float64Array | null;
}
