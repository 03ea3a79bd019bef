import { cn } from "../../lib/cn";

const COLS = 10;
const ROWS = 6;
const SHADES = ["fill-well-50", "fill-well-100", "fill-well-200", "fill-well-300", "fill-well-400", "fill-well-600"];

// A made-up smooth field that looks like a phase map: rich in the lower left (small μ, weak
// symmetry), a single state toward large μ. Decoration only; it is labelled as such.
function shade(c: number, r: number): string {
  const m = c / (COLS - 1);
  const tau = 1 - r / (ROWS - 1);
  const richness = Math.max(0, 1.15 - m * 1.3 + 0.45 * tau * (1 - m));
  return SHADES[Math.min(SHADES.length - 1, Math.floor(richness * (SHADES.length - 0.01)))];
}

/** An illustrative (μ, τ) grid sketch for empty states; never real data. */
export function GridSketch({ className }: { className?: string }) {
  const cell = 22;
  const x0 = 24;
  const y0 = 6;
  const cells = [];
  for (let r = 0; r < ROWS; r++) {
    for (let c = 0; c < COLS; c++) {
      cells.push(
        <rect key={`${r}-${c}`} x={x0 + c * cell} y={y0 + r * cell} width={cell - 3} height={cell - 3} rx="3" className={shade(c, r)} />,
      );
    }
  }
  const w = x0 + COLS * cell;
  const h = y0 + ROWS * cell;
  return (
    <svg viewBox={`0 0 ${w + 6} ${h + 24}`} role="img" aria-label="Illustration of a map grid over μ and τ" className={cn("w-full", className)}>
      {cells}
      <path d={`M${x0 + 1.5 * cell} ${y0 + ROWS * cell - 3} C ${x0 + 3 * cell} ${y0 + 3 * cell}, ${x0 + 5 * cell} ${y0 + cell}, ${x0 + 7.2 * cell} ${y0}`} fill="none" strokeWidth="2" strokeDasharray="5 4" className="stroke-ember-500" />
      <text x={x0 + (COLS * cell) / 2} y={h + 18} textAnchor="middle" className="fill-ink-faint font-mono text-[11px]">
        relaxation rate μ →
      </text>
      <text x="12" y={y0 + (ROWS * cell) / 2} textAnchor="middle" transform={`rotate(-90 12 ${y0 + (ROWS * cell) / 2})`} className="fill-ink-faint font-mono text-[11px]">
        τ →
      </text>
    </svg>
  );
}
