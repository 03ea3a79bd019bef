/**
 * Benchmark: eigenvalues-only Hessenberg QR (server/engine/spectra) against ml-matrix's
 * EigenvalueDecomposition (which always builds eigenvectors) on random Gaussian matrices.
 * Prints the median wall time of a few repetitions per size and the largest eigenvalue
 * mismatch between the two. Run: node --import tsx scripts/bench-eigen.ts [sizes…]
 */
import { EigenvalueDecomposition, Matrix } from "ml-matrix";
import { createRng } from "../server/engine/random/rng";
import { eigenvalues } from "../server/engine/spectra/eigenvalues";

function median(values: number[]): number {
  const s = [...values].sort((a, b) => a - b);
  return s[Math.floor(s.length / 2)];
}

function time(run: () => void, repeats: number): number {
  run(); // warm-up
  const times: number[] = [];
  for (let r = 0; r < repeats; r++) {
    const t0 = performance.now();
    run();
    times.push(performance.now() - t0);
  }
  return median(times);
}

function largestMismatch(ours: { re: Float64Array; im: Float64Array }, theirs: EigenvalueDecomposition) {
  const cmp = (x: number[], y: number[]) => x[0] - y[0] || x[1] - y[1];
  const a = Array.from(ours.re, (r, i) => [r, ours.im[i]]).sort(cmp);
  const b = theirs.realEigenvalues.map((r, i) => [r, theirs.imaginaryEigenvalues[i]]).sort(cmp);
  return Math.max(...a.map((p, i) => Math.hypot(p[0] - b[i][0], p[1] - b[i][1])));
}

const sizes = process.argv.slice(2).map(Number).filter((v) => v > 0);
for (const n of sizes.length > 0 ? sizes : [100, 200]) {
  const a = new Float64Array(n * n);
  createRng(2718, n).fillNormal(a);
  const rows = Array.from({ length: n }, (_, i) => Array.from(a.subarray(i * n, (i + 1) * n)));
  const m = new Matrix(rows);
  const repeats = n <= 100 ? 9 : 5;
  const ours = time(() => eigenvalues(a, n), repeats);
  const theirs = time(() => new EigenvalueDecomposition(m), repeats);
  const diff = largestMismatch(eigenvalues(a, n), new EigenvalueDecomposition(m));
  console.log(
    `N = ${n}: eigenvalues ${ours.toFixed(2)} ms, ml-matrix EigenvalueDecomposition ${theirs.toFixed(2)} ms, ` +
      `speed-up ${(theirs / ours).toFixed(2)}×, max |Δλ| = ${diff.toExponential(2)}`,
  );
}
