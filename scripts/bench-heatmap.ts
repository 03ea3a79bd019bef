// Benchmark (not a test): a 64 × 64 map's heatmap figure in Debian's chromium — first render and
// re-colour on a layer change, React commit and commit-to-next-paint, in milliseconds.
// Run: node --import tsx scripts/bench-heatmap.ts
import { rmSync } from "node:fs";
import http from "node:http";
import type { AddressInfo } from "node:net";
import { tmpdir } from "node:os";
import path from "node:path";
import { build } from "vite";
import react from "@vitejs/plugin-react";
import { readFile } from "node:fs/promises";
import { launchBrowser } from "../tests/helpers/browser";

const ROOT = path.resolve(import.meta.dirname, "bench-heatmap");
const OUT = path.join(tmpdir(), `equilibrist-bench-heatmap-${process.pid}`);

type Timing = { commit: number; paint: number };
type Result = { rects: number; firstCommit: number; firstPaint: number; changes: (Timing & { layer: string })[]; mounts: Timing[] };

function stats(xs: number[]) {
  const s = [...xs].sort((a, b) => a - b);
  return { median: s[Math.floor(s.length / 2)], max: s[s.length - 1] };
}

async function serve(dir: string): Promise<http.Server> {
  const server = http.createServer(async (req, res) => {
    const file = path.join(dir, (req.url ?? "/") === "/" ? "index.html" : decodeURIComponent(req.url!.split("?")[0]));
    if (!file.startsWith(dir)) return void res.writeHead(403).end();
    try {
      const body = await readFile(file);
      res.writeHead(200, { "content-type": file.endsWith(".js") ? "text/javascript" : file.endsWith(".html") ? "text/html" : "application/octet-stream" }).end(body);
    } catch {
      res.writeHead(404).end();
    }
  });
  await new Promise<void>((resolve) => server.listen(0, "127.0.0.1", resolve));
  return server;
}

async function main() {
  // A production build, as users get it (React without its development checks).
  await build({ root: ROOT, base: "./", logLevel: "error", plugins: [react()], build: { outDir: OUT, emptyOutDir: true }, configFile: false });
  const server = await serve(OUT);
  const browser = await launchBrowser();
  try {
    const page = await browser.newPage();
    await page.goto(`http://127.0.0.1:${(server.address() as AddressInfo).port}/`);
    await page.waitForFunction(() => (window as unknown as { benchResult?: unknown }).benchResult !== undefined, null, { timeout: 60_000 });
    const r = (await page.evaluate(() => (window as unknown as { benchResult: unknown }).benchResult)) as Result;
    const commit = stats(r.changes.map((c) => c.commit));
    const paint = stats(r.changes.map((c) => c.paint));
    const mount = stats(r.mounts.map((c) => c.paint));
    console.log(`[bench-heatmap] ${r.rects} cells (64 × 64) in chromium, production build`);
    console.log(`  first render (cold code): commit ${r.firstCommit.toFixed(1)} ms, to next paint ${r.firstPaint.toFixed(1)} ms`);
    console.log(`  render again (${r.mounts.length} mounts, warm): to next paint median ${mount.median.toFixed(1)} ms (max ${mount.max.toFixed(1)})`);
    console.log(`  layer change (${r.changes.length} changes): commit median ${commit.median.toFixed(1)} ms (max ${commit.max.toFixed(1)}), to next paint median ${paint.median.toFixed(1)} ms (max ${paint.max.toFixed(1)})`);
    if (browser.problems.length) console.warn(`  page problems: ${browser.problems.join("; ")}`);
  } finally {
    await browser.close();
    server.close();
    rmSync(OUT, { recursive: true, force: true });
  }
}

await main();
