import { assertPositive, assertPositiveInteger, assertTau } from "./checks";

/** Semi-axes of the elliptic-law support. */
export interface EllipseAxes {
  /** Semi-axis along the real line, g(1 + τ). */
  real: number;
  /** Semi-axis along the imaginary line, g(1 − τ). */
  imag: number;
}

/**
 * Elliptic law: for large N the eigenvalues of J = (g/√N)(c_s S + c_a A), corr(J_ij, J_ji) = τ,
 * fill uniformly the ellipse with semi-axes g(1 + τ) (real) and g(1 − τ) (imaginary)
 * (Sommers, Crisanti, Sompolinsky & Stein, PRL 60 (1988) 1895). Asymptotic (N → ∞).
 * @param g coupling gain g > 0
 * @param tau correlation τ ∈ [0, 1]
 * @returns the two semi-axes
 * @throws RangeError when g or τ is out of range
 */
export function ellipseAxes(g: number, tau: number): EllipseAxes {
  assertPositive("g", g);
  assertTau(tau);
  return { real: g * (1 + tau), imag: g * (1 - tau) };
}

/**
 * Points on the boundary of the elliptic-law support (Sommers et al., PRL 60 (1988) 1895),
 * λ(θ) = g(1 + τ) cos θ + i g(1 − τ) sin θ for θ = 2πk/count, k = 0..count (closed: the last
 * point repeats the first), for drawing beside a spectrum. At τ = 1 it degenerates to the
 * segment [−2g, 2g] (the semicircle support of the GOE).
 * @param g coupling gain g > 0
 * @param tau correlation τ ∈ [0, 1]
 * @param count number of distinct points, an integer ≥ 3 (default 128)
 * @returns parallel arrays of real and imaginary parts, length count + 1
 * @throws RangeError when g, τ or count is out of range
 */
export function ellipsePoints(g: number, tau: number, count = 128): { re: number[]; im: number[] } {
  const axes = ellipseAxes(g, tau);
  assertPositiveInteger("count", count);
  if (count < 3) throw new RangeError(`count must be at least 3, got ${count}`);
  const re: number[] = [];
  const im: number[] = [];
  for (let k = 0; k <= count; k++) {
    const theta = (2 * Math.PI * (k % count)) / count;
    re.push(axes.real * Math.cos(theta));
    im.push(axes.imag * Math.sin(theta));
  }
  return { re, im };
}

/**
 * Whether λ = re + i·im lies inside (or on) the elliptic-law ellipse of gain g and correlation τ
 * scaled by (1 + margin) (Sommers et al., PRL 60 (1988) 1895).
 * @param re real part of λ
 * @param im imaginary part of λ
 * @param g coupling gain g > 0
 * @param tau correlation τ ∈ [0, 1)
 * @param margin relative margin ≥ 0 for finite-N spill-over (default 0)
 * @returns true when (re/a)² + (im/b)² ≤ (1 + margin)²
 * @throws RangeError on non-finite input, τ = 1 (degenerate ellipse) or a negative margin
 */
export function insideEllipse(re: number, im: number, g: number, tau: number, margin = 0): boolean {
  const axes = ellipseAxes(g, tau);
  if (tau === 1) throw new RangeError("tau must be < 1 for insideEllipse (the ellipse is a segment at τ = 1)");
  if (!Number.isFinite(re) || !Number.isFinite(im)) throw new RangeError(`λ must be finite, got ${re} + ${im}i`);
  if (!(margin >= 0) || !Number.isFinite(margin)) throw new RangeError(`margin must be ≥ 0, got ${margin}`);
  const r = (re / axes.real) ** 2 + (im / axes.imag) ** 2;
  return r <= (1 + margin) ** 2;
}
