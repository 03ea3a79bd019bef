import type {
  ProbeAccess, ProbeComparison, ProbeFormat, ProbeResult, ProbeSearchState, ProbeStats, ProbeSummary, ProbeView,
} from "../../../shared/schemas/probes";
import { fromBytes } from "./probe-bytes";
import type { ProbeRecord } from "./probes.repo";

function inputSummary(bytes: Buffer | null): ProbeView["input"] {
  if (!bytes) return null;
  const v = fromBytes(bytes);
  const mean = v.reduce((a, b) => a + b, 0) / v.length;
  const sd = v.length > 1 ? Math.sqrt(v.reduce((a, b) => a + (b - mean) ** 2, 0) / (v.length - 1)) : 0;
  return { mean, sd, min: Math.min(...v), max: Math.max(...v) };
}

/** A probe as lists show it. */
export function toProbeSummary(r: ProbeRecord, access: ProbeAccess): ProbeSummary {
  const stats = r.stats as ProbeStats;
  return {
    id: r.id, title: r.title, fileName: r.fileName, format: r.format as ProbeFormat, n: r.n, mu: r.mu, nonlinearity: r.nonlinearity,
    gEstimate: stats.g?.estimate ?? null, tauEstimate: stats.tau?.estimate ?? null,
    ownerId: r.ownerId, ownerName: r.ownerName, groupId: r.groupId, groupName: r.groupName, access, status: r.status,
    createdAt: r.createdAt.toISOString(),
  };
}

/** A probe with its statistics, spectrum, search state, result and comparison. */
export function toProbeView(r: ProbeRecord, access: ProbeAccess): ProbeView {
  return {
    ...toProbeSummary(r, access),
    input: inputSummary(r.input),
    stats: r.stats as ProbeStats,
    spectrum: r.spectrum as ProbeView["spectrum"],
    failure: r.failure,
    search: (r.search as ProbeSearchState | null) ?? null,
    result: (r.result as ProbeResult | null) ?? null,
    comparison: (r.comparison as ProbeComparison | null) ?? null,
    updatedAt: r.updatedAt.toISOString(),
  };
}
