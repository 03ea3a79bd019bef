import type { LayerScale } from "../../lib/color-scale";
import { layerCaveat } from "../../lib/color-scale";
import { formatLayerValue, type PatternIds } from "../../lib/cell-paints";
import { SPECIAL_FILLS } from "../../lib/palettes";
import { wrapText } from "../../lib/wrap-text";
import { FONT } from "./figure-axes";

export interface LegendExtras {
  /** Some cell has a value in this layer (else the key says so instead of showing a bare bar). */
  values: boolean;
  pending: boolean;
  empty: boolean;
  failed: boolean;
}

const BAR_H = 12;

/** Lines of the legend's text and its total height at this width (the figure sizes itself by it). */
export function legendLayout(scale: LayerScale, width: number) {
  const chars = Math.max(24, Math.floor(width / 6.2));
  const unit = wrapText(scale.layer.unit, chars);
  const caveat = wrapText(layerCaveat(scale.layer), chars);
  const categoryRows = scale.kind === "category" ? Math.ceil(scale.entries.length / Math.max(1, Math.floor(width / 230))) : 0;
  const body = scale.kind === "category" ? categoryRows * 20 : BAR_H + 20;
  const height = 18 + unit.length * 14 + 6 + body + caveat.length * 14 + 24;
  return { unit, caveat, height, categoryRows };
}

function Swatch({ x, fill, label }: { x: number; fill: string; label: string }) {
  return (
    <g transform={`translate(${x},0)`}>
      <rect width={14} height={12} rx={2} fill={fill} stroke={SPECIAL_FILLS.pendingHatch} strokeWidth={0.5} />
      <text x={19} y={10} fontSize={11} fontFamily={FONT} fill={SPECIAL_FILLS.inkSoft}>
        {label}
      </text>
    </g>
  );
}

function ContinuousBar({ scale, width, gradientId }: { scale: Extract<LayerScale, { kind: "continuous" }>; width: number; gradientId: string }) {
  const barW = Math.min(width, 340);
  const [lo, hi] = scale.domain;
  const t = scale.transform === "log" ? Math.log10 : (v: number) => v;
  const pos = (v: number) => ((t(v) - t(lo)) / (t(hi) - t(lo) || 1)) * barW;
  const stops = Array.from({ length: 17 }, (_, k) => scale.lut[Math.round((k / 16) * (scale.lut.length - 1))]);
  return (
    <g>
      <defs>
        <linearGradient id={gradientId} x1="0" x2="1" y1="0" y2="0">
          {stops.map((c, k) => (
            <stop key={k} offset={k / 16} stopColor={c} />
          ))}
        </linearGradient>
      </defs>
      <rect width={barW} height={BAR_H} rx={2} fill={`url(#${gradientId})`} stroke={SPECIAL_FILLS.pendingHatch} strokeWidth={0.5} />
      {scale.ticks.map((v) => (
        <g key={v} transform={`translate(${pos(v)},0)`}>
          <line y1={BAR_H} y2={BAR_H + 4} stroke={SPECIAL_FILLS.inkSoft} />
          <text y={BAR_H + 15} textAnchor="middle" fontSize={10.5} fontFamily={FONT} fill={SPECIAL_FILLS.inkSoft}>
            {formatLayerValue(scale.layer.id, v)}
          </text>
        </g>
      ))}
    </g>
  );
}

/** The colour key under the heatmap: layer, unit, the colour bar or categories, caveat, special cells. */
export function ColorLegend(p: { scale: LayerScale; width: number; extras: LegendExtras; patterns: PatternIds; gradientId: string }) {
  const { scale, width } = p;
  const layout = legendLayout(scale, width);
  let y = 12;
  const perRow = Math.max(1, Math.floor(width / 230));
  const afterUnit = 18 + layout.unit.length * 14 + 6;
  const afterBody = afterUnit + (scale.kind === "category" ? layout.categoryRows * 20 : BAR_H + 20);
  return (
    <g aria-label={`Colour key: ${scale.layer.label}`}>
      <text y={y} fontSize={12} fontWeight={600} fontFamily={FONT} fill={SPECIAL_FILLS.ink}>
        {scale.layer.label}
      </text>
      {layout.unit.map((line, k) => (
        <text key={k} y={(y += 14)} fontSize={11} fontFamily={FONT} fill={SPECIAL_FILLS.inkSoft}>
          {line}
        </text>
      ))}
      <g transform={`translate(0,${afterUnit})`}>
        {!p.extras.values ? (
          <text y={12} fontSize={11} fontFamily={FONT} fill={SPECIAL_FILLS.inkSoft}>
            No cell has a value in this layer yet.
          </text>
        ) : scale.kind === "continuous" ? (
          <ContinuousBar scale={scale} width={width} gradientId={p.gradientId} />
        ) : (
          scale.entries.map((e, k) => (
            <g key={e.code} transform={`translate(${(k % perRow) * 230},${Math.floor(k / perRow) * 20})`}>
              <Swatch x={0} fill={e.color} label={e.label} />
            </g>
          ))
        )}
      </g>
      {layout.caveat.map((line, k) => (
        <text key={k} y={afterBody + 10 + k * 14} fontSize={11} fontStyle="italic" fontFamily={FONT} fill={SPECIAL_FILLS.inkSoft}>
          {line}
        </text>
      ))}
      <g transform={`translate(0,${afterBody + layout.caveat.length * 14 + 6})`}>
        {[
          p.extras.pending && { fill: `url(#${p.patterns.pending})`, label: "pending" },
          p.extras.empty && { fill: SPECIAL_FILLS.empty, label: "no value for this layer" },
          p.extras.failed && { fill: `url(#${p.patterns.failed})`, label: "failed" },
        ]
          .filter((s): s is { fill: string; label: string } => Boolean(s))
          .map((s, k) => (
            <Swatch key={s.label} x={k * Math.min(150, width / 3)} fill={s.fill} label={s.label} />
          ))}
      </g>
    </g>
  );
}
