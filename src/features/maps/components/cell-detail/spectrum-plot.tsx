import { scaleLinear } from "@visx/scale";
import type { CellResult } from "../../../../../shared/schemas/cell-result";
import { ellipsePoints } from "../../../../../shared/theory/elliptic-ellipse";
import { formatNumber } from "../../../../lib/format-number";
import { equalAspect } from "../../../../lib/axis-scale";
import { polylinePath } from "../../lib/plot-geometry";
import { PLOT_MARGIN, PlotFrame, plotArea } from "./plot-frame";

type Spectrum = NonNullable<CellResult["spectrum"]>;

/**
 * Elliptic-law scale of the coupling part of the Jacobian: rate network J has gain g; the field
 * network's Jacobian of f has entries of variance σ², so its spectrum spreads over σ√N.
 */
export function ellipseGain(ensemble: string, settings: Record<string, unknown>): number | null {
  const N = Number(settings.N);
  if (ensemble === "rate") return Number(settings.g) > 0 ? Number(settings.g) : null;
  if (ensemble === "field") return Number(settings.sigma ?? 1) > 0 && N > 0 ? Number(settings.sigma ?? 1) * Math.sqrt(N) : null;
  return null;
}

/** Eigenvalues of the Jacobian at one equilibrium, against the elliptic-law ellipse shifted by −μ. */
export function SpectrumPlot({ spectrum, mu, tau, gain, width }: { spectrum: Spectrum; mu: number; tau: number; gain: number | null; width: number }) {
  const height = Math.min(360, Math.max(240, width * 0.7));
  const { w, h } = plotArea(width, height);
  const ellipse = gain ? ellipsePoints(gain, tau, 96) : null;
  const ex = ellipse ? ellipse.re.map((r) => r - mu) : [];
  const ey = ellipse ? ellipse.im : [];
  const dom = equalAspect([...spectrum.re, ...ex, 0], [...spectrum.im, ...ey, 0], w, h, 1.1);
  const x = scaleLinear<number>({ domain: dom.x, range: [0, w] });
  const y = scaleLinear<number>({ domain: dom.y, range: [h, 0] });
  const title = `Eigenvalues of the Jacobian at the ${spectrum.choice === "first-stable" ? "first stable" : "most visited"} equilibrium of network ${spectrum.network}`;
  return (
    <div className="flex flex-col gap-2">
      <PlotFrame width={width} height={height} x={x} y={y} xLabel="Re λ" yLabel="Im λ" title={title}>
        <line x1={x(0)} x2={x(0)} y1={0} y2={h} stroke="#b13447" strokeDasharray="3 3" />
        {ellipse && <path d={polylinePath(ex.map((r, k) => ({ x: x(r) ?? 0, y: y(ey[k]) ?? 0 })))} fill="#acd0d7" fillOpacity={0.25} stroke="#1f6174" strokeWidth={1.5} />}
        {spectrum.re.map((r, k) => (
          <circle key={k} cx={x(r)} cy={y(spectrum.im[k])} r={2.6} fill={r < 0 ? "#16202a" : "#db6c2c"} />
        ))}
      </PlotFrame>
      <p className="text-xs leading-relaxed text-ink-soft" style={{ paddingLeft: PLOT_MARGIN.left }}>
        {title} ({spectrum.stable ? "stable" : "unstable"}). Dots right of the dashed line Re λ = 0 are unstable directions.
        {gain
          ? ` Shaded: the elliptic law for the coupling part, semi-axes ${formatNumber(gain * (1 + tau))} and ${formatNumber(gain * (1 - tau))}, shifted by −μ — a large-N result for the matrix at the origin, not conditioned on this equilibrium.`
          : ""}
      </p>
    </div>
  );
}
