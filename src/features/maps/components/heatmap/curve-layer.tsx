import type { CurveId, OverlayCurve } from "../../lib/overlay-curves";
import { polylinePath, type ContinuousPixelScale } from "../../lib/plot-geometry";
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
          const last = [...pts].reverse().find((p) => p !== null);
          return (
            <g key={c.id} data-curve={c.id}>
              <path d={polylinePath(pts)} fill="none" stroke="#fffdf8" strokeWidth={4.5} strokeOpacity={0.8} strokeLinejoin="round" />
              <path d={polylinePath(pts)} fill="none" stroke={c.color} strokeWidth={2} strokeDasharray={c.dash || undefined} strokeLinejoin="round" />
              {last && (
                <text x={last.x + 4} y={last.y + 12} fill={c.color} fontSize={11} fontFamily={FONT} fontWeight={600} stroke="#fffdf8" strokeWidth={3} paintOrder="stroke">
                  {c.label}
                </text>
              )}
            </g>
          );
        })}
    </g>
  );
}
