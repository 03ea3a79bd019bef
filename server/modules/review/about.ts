import { execFileSync } from "node:child_process";
import { readFileSync } from "node:fs";
import path from "node:path";
import { fileURLToPath } from "node:url";
import type { About } from "../../../shared/schemas/review";
import { ENGINE_VERSION } from "../../engine/cell/cell-input";
import { ensembles } from "../../engine/ensembles/registry";

const ROOT = path.resolve(path.dirname(fileURLToPath(import.meta.url)), "../../..");

function packageFacts(): { name: string; version: string } {
  try {
    const pkg = JSON.parse(readFileSync(path.join(ROOT, "package.json"), "utf8")) as { name?: string; version?: string };
    return { name: pkg.name ?? "equilibrist", version: pkg.version ?? "unknown" };
  } catch {
    return { name: "equilibrist", version: "unknown" };
  }
}

/** `git rev-parse HEAD` in the project folder, or "unknown" (no git, not a checkout). */
function gitCommit(): string {
  if (process.env.EQUILIBRIST_COMMIT) return process.env.EQUILIBRIST_COMMIT;
  try {
    const out = execFileSync("git", ["rev-parse", "HEAD"], { cwd: ROOT, encoding: "utf8", stdio: ["ignore", "pipe", "ignore"], timeout: 5000 });
    return /^[0-9a-f]{40}$/.test(out.trim()) ? out.trim() : "unknown";
  } catch {
    return "unknown";
  }
}

let cached: About | null = null;

/**
 * What software answers: package name and version, the git commit (read once per process, when
 * the review router is created at server start; EQUILIBRIST_COMMIT overrides it for deployments
 * without .git), the engine version and every ensemble's version.
 */
export function readAbout(): About {
  if (!cached) {
    cached = {
      ...packageFacts(),
      commit: gitCommit(),
      engineVersion: ENGINE_VERSION,
      ensembles: Object.values(ensembles).map((e) => ({ id: e.id, version: e.version })),
      startedAt: new Date().toISOString(),
    };
  }
  return cached;
}
