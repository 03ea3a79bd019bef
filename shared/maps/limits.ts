import type { SiteRole } from "../schemas/auth";

/**
 * Limits that protect the machines, by site role. The create schema (shared/schemas/maps.ts)
 * already caps what nobody may exceed (grid 64 × 64, N 500 / 200, 64 networks, 256 starts);
 * these add the per-role budget and the number of maps one account may have filling at once.
 * The server checks them on create (422 naming the limit and the field); the new-map form can
 * show them beforehand.
 */
export interface MapLimits {
  /** Largest number of μ steps and of τ steps. */
  maxSteps: number;
  /** Largest N of the rate network. */
  maxRateN: number;
  /** Largest N of the field network. */
  maxFieldN: number;
  /** Largest networks × starts of one cell (runs per cell). */
  maxRunsPerCell: number;
  /** Most maps queued or running at once per account. */
  maxInFlight: number;
}

export const mapLimits: Readonly<Record<SiteRole, MapLimits>> = Object.freeze({
  member: { maxSteps: 64, maxRateN: 500, maxFieldN: 200, maxRunsPerCell: 2048, maxInFlight: 3 },
  admin: { maxSteps: 64, maxRateN: 500, maxFieldN: 200, maxRunsPerCell: 16384, maxInFlight: 10 },
});

/** Names of the limits, as they appear in 422 messages. */
export const limitLabels: Readonly<Record<keyof MapLimits, string>> = Object.freeze({
  maxSteps: "grid steps per axis",
  maxRateN: "rate network N",
  maxFieldN: "field network N",
  maxRunsPerCell: "runs per cell (networks × starts)",
  maxInFlight: "maps in flight",
});

/** What a limit check needs of a create body. */
export interface LimitedManifest {
  ensemble: string;
  settings: { N: number };
  mu: { steps: number };
  tau: { steps: number };
  budget: { networks: number; starts: number };
}

/** One broken limit: the field it concerns (dotted path) and a message naming the limit. */
export interface LimitIssue {
  limit: keyof MapLimits;
  path: string;
  message: string;
}

function issue(limit: keyof MapLimits, path: string, most: number, got: number, role: SiteRole): LimitIssue {
  return { limit, path, message: `Limit "${limitLabels[limit]}": at most ${most} for ${role}s, got ${got}` };
}

/**
 * The limits a create body breaks for an account of `role` (empty when it fits). The in-flight
 * limit needs the database and is checked by the server on its own (`inFlightIssue`).
 */
export function limitIssues(m: LimitedManifest, role: SiteRole): LimitIssue[] {
  const l = mapLimits[role];
  const out: LimitIssue[] = [];
  if (m.mu.steps > l.maxSteps) out.push(issue("maxSteps", "mu.steps", l.maxSteps, m.mu.steps, role));
  if (m.tau.steps > l.maxSteps) out.push(issue("maxSteps", "tau.steps", l.maxSteps, m.tau.steps, role));
  const maxN = m.ensemble === "field" ? l.maxFieldN : l.maxRateN;
  if (m.settings.N > maxN) out.push(issue(m.ensemble === "field" ? "maxFieldN" : "maxRateN", "settings.N", maxN, m.settings.N, role));
  const runs = m.budget.networks * m.budget.starts;
  if (runs > l.maxRunsPerCell) out.push(issue("maxRunsPerCell", "budget.starts", l.maxRunsPerCell, runs, role));
  return out;
}

/** The in-flight limit's issue when `inFlight` maps already fill (null while there is room). */
export function inFlightIssue(inFlight: number, role: SiteRole): LimitIssue | null {
  const most = mapLimits[role].maxInFlight;
  if (inFlight < most) return null;
  return {
    limit: "maxInFlight",
    path: "",
    message: `Limit "${limitLabels.maxInFlight}": at most ${most} maps queued or running at once for ${role}s; wait for one to finish or cancel one`,
  };
}
