import { useId, type CSSProperties } from "react";
import type { BoundaryRow } from "../../../../shared/schemas/review";
import { mStable, originStabilityMu } from "../../../../shared/theory/index";
import { ESTIMATE_COLOR, FIGURE_INK, FIGURE_PAPER, FIGURE_PENDING, FIGURE_SOFT, PREDICTED_COLOR, PREDICTED_STABLE_COLOR, shareColor } from "../lib/colors";
import { formatNumber } from "../../../lib/format-number";
import { axisScale, band, isLogAxis, pickEvenly, type AxisSpec, type ContinuousPixelScale } from "../../../lib/axis-scale";

export interface BoundaryFigureProps {
  mu: AxisSpec;
  tau: AxisSpec;
  mus: number[];
  taus: number[];
  /** Share of networks with exactly one stable state, values[j][i] (null: not done). */
  share: (number | null)[][];
  rows: BoundaryRow[];
  ensemble: string;
  /** Field: μ_c = σ√N. */
  muCritical: number | null;
  /** Rate: the gain g. */
  gain: number | null;
  width: number;
}

const M = { left: 52, right: 16, top: 12, bottom: 40 };

interface Curve {
  id: string;
  label: string;
  color: string;
  dash?: string;
  points: { mu: number; tau: number }[];
}

/** The predicted lines over the τ range: field m = 1 and m_st(τ); rate the origin line g(1+τ). */
export function predictedCurves(ensemble: string, muCritical: number | null, gain: number | null, tauRange: [number, number]): Curve[] {
  const [t0, t1] = [Math.max(0, tauRange[0]), Math.min(1, tauRange[1])];
  const taus = Array.from({ length: 61 }, (_, k) => t0 + ((t1 - t0) * k) / 60);
  if (ensemble === "field" && muCritical) {
    return [
      { id: "m1", label: "Predicted m = 1 (μ = σ√N)", color: PREDICTED_COLOR, points: taus.map((tau) => ({ mu: muCritical, tau })) },
      { id: "mst", label: "Predicted m_st(τ) (stable ones abundant below)", color: PREDICTED_STABLE_COLOR, dash: "5 3", points: taus.filter((t) => t > 0.02).map((tau) => ({ mu: muCritical * mStable(tau), tau })) },
    ];
  }
  if (ensemble === "rate" && gain) {
    return [{ id: "origin", label: "Predicted origin line μ = g(1 + τ)", color: PREDICTED_COLOR, points: taus.map((tau) => ({ mu: originStabilityMu(gain, tau), tau })) }];
  }
  return [];
}

function path(points: { mu: number; tau: number }[], x: ContinuousPixelScale, y: ContinuousPixelScale, logMu: boolean): string {
  return points.filter((p) => p.mu > 0 || !logMu).map((p, k) => `${k ? "L" : "M"}${x(p.mu).toFixed(1)} ${y(p.tau).toFixed(1)}`).join("");
}

/**
 * The boundary over the map: the share of networks with exactly one stable state as a heatmap,
 * the predicted lines, each τ row's estimate μ½ with its bootstrap 95 % band, and the μ below
 * which stable equilibria stopped being found (open triangles).
 */
export function BoundaryFigure(p: BoundaryFigureProps) {
  const clip = `clip${useId().replace(/[^a-zA-Z0-9]/g, "")}`;
  const plotW = Math.max(140, p.width - M.left - M.right);
  const plotH = Math.max(120, Math.min(plotW * 0.6, 40 * p.tau.steps + 80));
  const xRange: [number, number] = [0, plotW];
  const yRange: [number, number] = [plotH, 0];
  const x = axisScale(p.mu, xRange);
  const y = axisScale(p.tau, yRange);
  const logMu = isLogAxis(p.mu);
  const curves = predictedCurves(p.ensemble, p.muCritical, p.gain, y.domain() as [number, number]);
  const crossed = p.rows.filter((r) => r.status === "crossed" && r.muHalf !== null);
  const height = M.top + plotH + M.bottom;

  return (
    <svg width={p.width} height={height} viewBox={`0 0 ${p.width} ${height}`} role="img" aria-label="Boundary estimate per τ row over the share of networks with one stable state" fontFamily="Inter, sans-serif">
      <rect width={p.width} height={height} fill={FIGURE_PAPER} />
      <g transform={`translate(${M.left},${M.top})`}>
        <clipPath id={clip}><rect width={plotW} height={plotH} /></clipPath>
        {p.share.map((row, j) => row.map((s, i) => {
          const bx = band(i, p.mu.steps, xRange);
          const by = band(j, p.tau.steps, yRange);
          return <rect key={`${i},${j}`} x={bx.start} y={by.start} width={bx.size + 0.4} height={by.size + 0.4} fill={s === null ? FIGURE_PENDING : shareColor(s)} />;
        }))}
        <g clipPath={`url(#${clip})`} fill="none">
          {curves.map((c) => <path key={c.id} d={path(c.points, x, y, logMu)} stroke={c.color} strokeWidth={1.8} strokeDasharray={c.dash} />)}
          {crossed.length > 1 && <path d={path(crossed.map((r) => ({ mu: r.muHalf!, tau: r.tau })), x, y, logMu)} stroke={ESTIMATE_COLOR} strokeWidth={1.4} strokeDasharray="2 2" />}
          {crossed.map((r) => (
            <g key={r.j} stroke={ESTIMATE_COLOR} strokeWidth={1.6}>
              {r.low !== null && r.high !== null && <path d={`M${x(r.low)} ${y(r.tau)}H${x(r.high)}M${x(r.low)} ${y(r.tau) - 4}v8M${x(r.high)} ${y(r.tau) - 4}v8`} />}
              <circle cx={x(r.muHalf!)} cy={y(r.tau)} r={3.6} fill={ESTIMATE_COLOR} stroke={FIGURE_PAPER} strokeWidth={1} />
            </g>
          ))}
          {p.rows.filter((r) => r.muLost !== null).map((r) => (
            <path key={`lost${r.j}`} d={`M${x(r.muLost!) - 1} ${y(r.tau)}l7 -4.5v9z`} stroke={FIGURE_INK} strokeWidth={1.2} fill={FIGURE_PAPER} />
          ))}
        </g>
        <rect width={plotW} height={plotH} fill="none" stroke={FIGURE_SOFT} strokeWidth={0.8} />
        {pickEvenly(p.mus, 6).map((v) => <text key={`x${v}`} x={x(v)} y={plotH + 15} fontSize={11} textAnchor="middle" fill={FIGURE_INK}>{formatNumber(v)}</text>)}
        <text x={plotW / 2} y={plotH + 31} fontSize={11} textAnchor="middle" fill={FIGURE_SOFT}>relaxation rate μ</text>
        {pickEvenly(p.taus, 6).map((v) => <text key={`y${v}`} x={-6} y={y(v) + 4} fontSize={11} textAnchor="end" fill={FIGURE_INK}>{formatNumber(v)}</text>)}
        <text transform={`translate(${-38},${plotH / 2}) rotate(-90)`} fontSize={11} textAnchor="middle" fill={FIGURE_SOFT}>asymmetry τ</text>
      </g>
    </svg>
  );
}

/** The figure's key, as HTML beside it (prints with the page). */
export function BoundaryLegend({ ensemble, muCritical, gain }: Pick<BoundaryFigureProps, "ensemble" | "muCritical" | "gain">) {
  const curves = predictedCurves(ensemble, muCritical, gain, [0, 1]);
  const swatch = (style: CSSProperties) => <span aria-hidden="true" className="inline-block h-0 w-6 border-t-2 align-middle" style={style} />;
  return (
    <ul className="flex flex-wrap gap-x-5 gap-y-1.5 text-xs text-ink-soft">
      <li className="flex items-center gap-2">
        <span aria-hidden="true" className="inline-block h-2.5 w-2.5 rounded-full" style={{ background: ESTIMATE_COLOR }} />
        μ½ per τ row, with its bootstrap 95 % band
      </li>
      <li className="flex items-center gap-2"><span aria-hidden="true" className="font-mono text-ink">◁</span>stable states last found (below: none)</li>
      {curves.map((c) => (
        <li key={c.id} className="flex items-center gap-2">{swatch({ borderColor: c.color, borderTopStyle: c.dash ? "dashed" : "solid" })}{c.label}</li>
      ))}
      <li className="flex items-center gap-2">
        <span aria-hidden="true" className="inline-block h-2.5 w-8 rounded-sm" style={{ background: `linear-gradient(90deg, ${shareColor(0)}, ${shareColor(1)})` }} />
        share of networks with one stable state, 0 → 1
      </li>
    </ul>
  );
}
