import { cn } from "../../lib/cn";

// A one-dimensional "random" potential (three fixed sines) sampled once; its minima carry a
// settled ball (stable equilibria), its maxima a hollow ring (unstable ones).
const WIDTH = 640;
const HEIGHT = 260;
const SAMPLES = 240;

function potential(u: number): number {
  return 0.9 * Math.sin(1.25 * u) + 0.42 * Math.sin(2.6 * u + 1) + 0.1 * Math.sin(5.3 * u + 2);
}

type Point = { x: number; y: number };

function sampleLandscape(): { points: Point[]; minima: Point[]; maxima: Point[] } {
  const points: Point[] = [];
  for (let i = 0; i <= SAMPLES; i++) {
    const u = (i / SAMPLES) * 7.2;
    points.push({ x: (i / SAMPLES) * WIDTH, y: HEIGHT * 0.55 - potential(u) * 62 });
  }
  const minima: Point[] = [];
  const maxima: Point[] = [];
  for (let i = 1; i < points.length - 1; i++) {
    const [a, b, c] = [points[i - 1].y, points[i].y, points[i + 1].y];
    if (b > a && b >= c) minima.push(points[i]);
    if (b < a && b <= c) maxima.push(points[i]);
  }
  return { points, minima, maxima };
}

const LANDSCAPE = sampleLandscape();
const PATH = LANDSCAPE.points.map((p, i) => `${i ? "L" : "M"}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(" ");

/** Decorative illustration for the signed-out pages. */
export function Landscape({ className }: { className?: string }) {
  const dots = [];
  for (let r = 0; r < 7; r++) for (let c = 0; c < 17; c++) dots.push({ x: 20 + c * 37.5, y: 16 + r * 34 });
  return (
    <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} aria-hidden="true" className={cn("w-full", className)}>
      {dots.map((d) => (
        <circle key={`${d.x}-${d.y}`} cx={d.x} cy={d.y} r="1.4" className="fill-well-700" />
      ))}
      <defs>
        <linearGradient id="landscape-fill" x1="0" y1="0" x2="0" y2="1">
          <stop offset="0%" stopColor="#184c5c" stopOpacity="0.75" />
          <stop offset="100%" stopColor="#184c5c" stopOpacity="0" />
        </linearGradient>
      </defs>
      <path d={`${PATH} L${WIDTH} ${HEIGHT} L0 ${HEIGHT} Z`} fill="url(#landscape-fill)" />
      <path d={PATH} fill="none" strokeWidth="3" strokeLinecap="round" className="stroke-well-300" />
      {LANDSCAPE.maxima.map((p) => (
        <circle key={`max-${p.x}`} cx={p.x} cy={p.y - 9} r="6" fill="none" strokeWidth="2" className="stroke-well-200" />
      ))}
      {LANDSCAPE.minima.map((p) => (
        <circle key={`min-${p.x}`} cx={p.x} cy={p.y - 10} r="8.5" className="fill-ember-400" />
      ))}
    </svg>
  );
}
