import type { ReactNode } from "react";
import type { ProbeView } from "../../../../shared/schemas/probes";
import { formatNumber } from "../../../lib/format-number";
import { interval, plusMinus } from "../lib/format";

function Fact({ label, value, detail }: { label: ReactNode; value: ReactNode; detail?: ReactNode }) {
  return (
    <div className="flex flex-col gap-0.5 rounded-lg bg-paper px-3 py-2 ring-1 ring-line">
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd className="font-mono text-base text-ink tabular-nums">{value}</dd>
      {detail && <dd className="text-[0.7rem] text-ink-faint">{detail}</dd>}
    </div>
  );
}

/** What the matrix is: N, ĝ and τ̂ with standard errors, entry and diagonal statistics, input. */
export function MatrixFacts({ probe }: { probe: ProbeView }) {
  const s = probe.stats;
  return (
    <div className="flex flex-col gap-3">
      <dl className="grid grid-cols-2 gap-3 lg:grid-cols-4">
        <Fact label="Units N" value={s.n} detail={`${s.pairs} pairs i < j`} />
        <Fact label="Gain ĝ = √(N·var J_ij, i≠j)" value={plusMinus(s.g)} detail={s.g ? interval(s.g) : "needs N ≥ 3"} />
        <Fact label="Symmetry τ̂ = corr(J_ij, J_ji)" value={plusMinus(s.tau)} detail={s.tau ? `${interval(s.tau)} (Fisher z)` : "needs N ≥ 4"} />
        <Fact label="Relaxation rate μ" value={formatNumber(probe.mu)} detail={s.g ? `μ/ĝ = ${formatNumber(probe.mu / s.g.estimate)}` : undefined} />
        <Fact label="Off-diagonal mean" value={`${formatNumber(s.offDiagonal.mean)} ± ${formatNumber(s.offDiagonal.meanSe, 2)}`} detail={`sd ${formatNumber(s.offDiagonal.sd)} over ${s.offDiagonal.count} entries`} />
        <Fact label="Diagonal mean" value={formatNumber(s.diagonal.mean)} detail={`range [${formatNumber(s.diagonal.min)}, ${formatNumber(s.diagonal.max)}]`} />
        <Fact label="Diagonal sd" value={formatNumber(s.diagonal.sd)} detail={s.ensembleDiagonalSd != null ? `ensemble at ĝ, τ̂: ${formatNumber(s.ensembleDiagonalSd)}` : undefined} />
        <Fact label="Mean row sum Σ_j J_ij" value={formatNumber(s.rowSumMean)} detail={`‖J‖_F = ${formatNumber(s.frobenius)}`} />
      </dl>
      <p className="text-xs text-ink-soft">
        Estimates are ± one standard error. ĝ treats the pairs (J_ij, J_ji) as the independent units; τ̂'s interval uses Fisher's z transform (normal theory).
        {" "}φ = {probe.nonlinearity}; input {probe.input ? `vector: mean ${formatNumber(probe.input.mean)}, sd ${formatNumber(probe.input.sd)}, range [${formatNumber(probe.input.min)}, ${formatNumber(probe.input.max)}]` : "I = 0"}.
      </p>
    </div>
  );
}
