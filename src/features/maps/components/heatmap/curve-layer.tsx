import type { CurveId, OverlayCurve } from "../../lib/overlay-curves";
import type { ContinuousPixelScale } from "../../../../lib/axis-scale";
import { polylinePath } from "../../lib/plot-geometry";
import { FONT } from "./figure-axes";

interface CurveLayerProps {
  curves: readonly OverlayCurve[];
  shown: ReadonlySet<CurveId>;
  x: ContinuousPixelScale;
  y: ContinuousPixelScale;
  clipId: string;
}

function inDomain(scale: ContinuousPixelScale, v: number): boolean {
  const [a, b] = scale.domain() as [number, number];
  return v >= Math.min(a, b) && v <= Math.max(a, b);
}

/** The predicted curves over the cells, clipped to the plot, each labelled where it ends. */
export function CurveLayer({ curves, shown, x, y, clipId }: CurveLayerProps) {
  return (
    <g clipPath={`url(#${clipId})`} pointerEvents="none">
      {curves
        .filter((c) => shown.has(c.id))
        .map((c) => {
          const pts = c.points.map((p) => (p.mu > 0 && inDomain(x, p.mu) && inDomain(y, p.tau) ? { x: x(p.mu) ?? NaN, y: y(p.tau) ?? NaN } : null));
          // m = 1 is labelled at its foot, so it does not sit on m_st(τ)'s label where both meet at τ = 1.
          const labelAt = c.id === "m-one" ? pts.find((p) => p !== null) : [...pts].reverse().find((p) => p !== null);
          return (
            <g key={c.id} data-curve={c.id}>
              <path d={polylinePath(pts)} fill="none" stroke="#fffdf8" strokeWidth={4.5} strokeOpacity={0.8} strokeLinejoin="round" />
              <path d={polylinePath(pts)} fill="none" stroke={c.color} strokeWidth={2} strokeDasharray={c.dash || undefined} strokeLinejoin="round" />
              {labelAt && (
                <text x={labelAt.x + 4} y={c.id === "m-one" ? labelAt.y - 6 : labelAt.y + 12} fill={c.color} fontSize={11} fontFamily={FONT} fontWeight={600} stroke="#fffdf8" strokeWidth={3} paintOrder="stroke">
                  {c.label}
                </text>
              )}
            </g>
          );
        })}
    </g>
  );
}
