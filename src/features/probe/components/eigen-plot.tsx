import { AxisBottom, AxisLeft } from "@visx/axis";
import { scaleLinear } from "@visx/scale";
import type { ProbeView } from "../../../../shared/schemas/probes";
import { equalAspect } from "../../../lib/axis-scale";
import { formatNumber } from "../../../lib/format-number";

const M = { left: 52, right: 14, top: 12, bottom: 44 };
const FONT = "Inter, ui-sans-serif, system-ui, sans-serif";
const tick = { fill: "#55606b", fontSize: 10.5, fontFamily: FONT };

/**
 * Boundary of the elliptic-law support of gain g and correlation τ: semi-axes g(1 + τ) (real)
 * and g(1 − τ) (imaginary) (Sommers, Crisanti, Sompolinsky & Stein, PRL 60 (1988) 1895), for
 * τ ∈ [−1, 1]; a large-N result.
 */
export function ellipsePath(g: number, tau: number, count = 120): { re: number; im: number }[] {
  const t = Math.max(-1, Math.min(1, tau));
  return Array.from({ length: count + 1 }, (_, k) => {
    const th = (2 * Math.PI * (k % count)) / count;
    return { re: g * (1 + t) * Math.cos(th), im: g * (1 - t) * Math.sin(th) };
  });
}

/**
 * Eigenvalues of J against the elliptic-law ellipse of the estimated ĝ and τ̂, with the line
 * Re λ = μ: the origin (I = 0, φ'(0) = 1) is unstable along every eigenvalue right of it.
 */
export function EigenPlot({ probe, width }: { probe: ProbeView; width: number }) {
  const { re, im } = probe.spectrum;
  const g = probe.stats.g?.estimate ?? null;
  const tau = probe.stats.tau?.estimate ?? 0;
  const ellipse = g ? ellipsePath(g, tau) : [];
  const height = Math.round(Math.min(420, Math.max(260, width * 0.62)));
  const w = Math.max(80, width - M.left - M.right);
  const h = height - M.top - M.bottom;
  const dom = equalAspect([...re, ...ellipse.map((p) => p.re), probe.mu], [...im, ...ellipse.map((p) => p.im)], w, h, 1.12);
  const x = scaleLinear<number>({ domain: dom.x, range: [0, w] });
  const y = scaleLinear<number>({ domain: dom.y, range: [h, 0] });
  const beyond = re.filter((r) => r > probe.mu).length;
  const path = ellipse.map((p, k) => `${k ? "L" : "M"}${x(p.re).toFixed(1)} ${y(p.im).toFixed(1)}`).join("");
  const fmt = (v: unknown) => formatNumber(Number(v));
  return (
    <figure className="flex flex-col gap-2">
      <svg width={width} height={height} viewBox={`0 0 ${width} ${height}`} role="img" aria-label={`Eigenvalues of J (${re.length}) against the elliptic law`} fontFamily={FONT}>
        <g transform={`translate(${M.left},${M.top})`}>
          <rect width={w} height={h} fill="#fbf8f1" />
          {path && <path d={path} fill="#acd0d7" fillOpacity={0.28} stroke="#1f6174" strokeWidth={1.5} />}
          <line x1={x(probe.mu)} x2={x(probe.mu)} y1={0} y2={h} stroke="#b13447" strokeDasharray="4 3" />
          <text x={x(probe.mu) + 4} y={12} fontSize={10.5} fill="#b13447">Re λ = μ</text>
          {re.map((r, k) => (
            <circle key={k} cx={x(r)} cy={y(im[k])} r={re.length > 600 ? 1.6 : 2.4} fill={r > probe.mu ? "#db6c2c" : "#16202a"} />
          ))}
          <AxisBottom top={h} scale={x} numTicks={Math.max(2, Math.floor(w / 80))} tickFormat={fmt} stroke="#55606b" tickStroke="#55606b" tickLabelProps={tick} label="Re λ" labelProps={{ fill: "#16202a", fontSize: 11.5, fontFamily: FONT, textAnchor: "middle" }} labelOffset={10} />
          <AxisLeft scale={y} numTicks={Math.max(2, Math.floor(h / 40))} tickFormat={fmt} stroke="#55606b" tickStroke="#55606b" tickLabelProps={{ ...tick, textAnchor: "end", dx: -2, dy: 3 }} label="Im λ" labelProps={{ fill: "#16202a", fontSize: 11.5, fontFamily: FONT, textAnchor: "middle" }} labelOffset={22} />
        </g>
      </svg>
      <figcaption className="text-xs leading-relaxed text-ink-soft" style={{ paddingLeft: M.left }}>
        {re.length} eigenvalues of J. {beyond} lie right of Re λ = μ = {formatNumber(probe.mu)}: unstable directions of the origin when I = 0.
        {g
          ? ` Shaded: the elliptic law for ĝ = ${formatNumber(g)}, τ̂ = ${formatNumber(tau)} (semi-axes ${formatNumber(g * (1 + Math.max(-1, Math.min(1, tau))))} and ${formatNumber(g * (1 - Math.max(-1, Math.min(1, tau))))}), a large-N prediction for random couplings with these statistics; a trained matrix's outliers sit outside it.`
          : " No ellipse: ĝ is undefined for this matrix."}
      </figcaption>
    </figure>
  );
}
