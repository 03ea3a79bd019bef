import { randomUUID } from "node:crypto";
import type PgBoss from "pg-boss";
import {
  probeLimits, type ProbeResult, type ProbeSearchSettings, type ProbeSearchState, type ProbeSummary, type ProbeUploadFields, type ProbeView,
} from "../../../shared/schemas/probes";
import type { Db } from "../../db/client";
import { requireActor, type Actor } from "../../lib/actor";
import { ConflictError, ForbiddenError, InvalidError, NotFoundError, UnavailableError } from "../../lib/errors";
import { PROBE_SEARCH_QUEUE } from "../../queue/queues";
import { sendInTransaction } from "../../queue/send";
import type { GroupsService } from "../groups/groups.service";
import { matrixStats } from "./analysis/matrix-stats";
import { readInputUpload, readMatrixUpload, type UploadedFile } from "./parse/read-upload";
import { toBytes } from "./probe-bytes";
import type { ProbePool } from "./probe.pool";
import { canSearch, probeAccessOf } from "./probes.access";
import * as repo from "./probes.repo";
import { toProbeSummary, toProbeView } from "./probes.view";

export interface ProbesServiceDeps {
  db: Db;
  groups: GroupsService;
  /** Computes the spectrum at upload (one thread in the web server). */
  pool: ProbePool;
  /** Started pg-boss; without it a search answers 503. */
  boss?: PgBoss;
}

type Reader = Actor | null | undefined;

/** N² × starts × (1 + comparison networks): the multiply-adds of a search, up to its step counts. */
export function searchWork(n: number, s: ProbeSearchSettings): number {
  return n * n * s.starts * (1 + s.compareNetworks);
}

function stem(fileName: string): string {
  const dot = fileName.lastIndexOf(".");
  return (dot > 0 ? fileName.slice(0, dot) : fileName).slice(0, 120) || "Uploaded matrix";
}

/**
 * Probes: upload (parse, statistics, spectrum, one insert), reads with access rules, the
 * equilibrium search (state and job in one transaction), downloads of equilibria, delete.
 */
export class ProbesService {
  constructor(private readonly deps: ProbesServiceDeps) {}

  /** The probe and the reader's access; another account's probe (outside its groups) → 404. */
  async getReadable(actor: Reader, id: string) {
    const me = requireActor(actor);
    const record = await repo.findProbe(this.deps.db, id, me.id);
    const access = record ? probeAccessOf(record, me.id) : null;
    if (!record || !access) throw new NotFoundError("Probe not found");
    return { me, record, access };
  }

  /** Parses and checks the files, computes statistics and spectrum, then stores the probe. */
  async upload(actor: Reader, files: { matrix: UploadedFile; input: UploadedFile | null }, fields: ProbeUploadFields): Promise<ProbeView> {
    const me = requireActor(actor);
    const m = readMatrixUpload(files.matrix);
    const input = files.input ? readInputUpload(files.input, m.n) : null;
    if (fields.groupId) await this.deps.groups.requireGroupRole(me, fields.groupId, "editor");
    const stats = matrixStats(m.data, m.n);
    const spectrum = await this.deps.pool.spectrum(m.data, m.n);
    const id = await repo.insertProbe(this.deps.db, {
      ownerId: me.id, groupId: fields.groupId ?? null, title: fields.title ?? stem(files.matrix.originalname),
      fileName: files.matrix.originalname.slice(0, 200), format: m.format, n: m.n, matrix: toBytes(m.data),
      input: input ? toBytes(input) : null, mu: fields.mu, nonlinearity: fields.nonlinearity, stats, spectrum,
    });
    return this.get(me, id);
  }

  async list(actor: Reader): Promise<ProbeSummary[]> {
    const me = requireActor(actor);
    const rows = await repo.listProbes(this.deps.db, me.id);
    return rows.flatMap((r) => {
      const access = probeAccessOf(r, me.id);
      return access ? [toProbeSummary(r, access)] : [];
    });
  }

  async get(actor: Reader, id: string): Promise<ProbeView> {
    const { record, access } = await this.getReadable(actor, id);
    return toProbeView(record, access);
  }

  /** Starts a search: checks rights and the work limit, then writes its state and job at once. */
  async search(actor: Reader, id: string, settings: ProbeSearchSettings): Promise<ProbeView> {
    const { me, record, access } = await this.getReadable(actor, id);
    if (!canSearch(access)) throw new ForbiddenError("You can read this probe but not run searches on it");
    const most = probeLimits.maxSearchWork[me.siteRole];
    const work = searchWork(record.n, settings);
    if (work > most) {
      const message = `Limit "search work (N² × starts × (1 + comparison networks))": at most ${most.toExponential(1)} for ${me.siteRole}s, got ${work.toExponential(2)}; use fewer starts or comparison networks`;
      throw new InvalidError(message, [{ path: "starts", message }]);
    }
    const boss = this.deps.boss;
    if (!boss) throw new UnavailableError("The job queue is not running; searches cannot start");
    await this.deps.db.transaction(async (tx) => {
      const row = await repo.lockProbe(tx, id);
      if (!row) throw new NotFoundError("Probe not found");
      if (row.status === "searching") throw new ConflictError("A search of this probe is already running");
      const state: ProbeSearchState = {
        id: randomUUID(), settings, requestedAt: new Date().toISOString(), startedAt: null, finishedAt: null,
        startsDone: 0, networksDone: 0, skippedComparison: null,
      };
      await repo.updateProbe(tx, id, { status: "searching", search: state, result: null, comparison: null, failure: null });
      await sendInTransaction(boss, tx, PROBE_SEARCH_QUEUE, { probeId: id, searchId: state.id });
    });
    return this.get(me, id);
  }

  /** One equilibrium of the last search with its state vector x*, as JSON or CSV. */
  async equilibrium(actor: Reader, id: string, e: number, format: "csv" | "json") {
    const { record } = await this.getReadable(actor, id);
    const row = (record.result as ProbeResult | null)?.equilibria?.[e];
    const x = row ? await repo.findEquilibriumState(this.deps.db, id, e) : null;
    if (!row || !x) throw new NotFoundError(`The last search has no equilibrium ${e}`);
    const fileName = `${stem(record.title).replace(/[^A-Za-z0-9._-]+/g, "-")}-equilibrium-${e}.${format}`;
    const body = { probeId: id, title: record.title, mu: record.mu, nonlinearity: record.nonlinearity, n: record.n, ...row, x };
    if (format === "json") return { fileName, body };
    const header = [`# equilibrium ${e} of probe "${record.title}" (${id})`, `# dx/dt = -mu x + J ${record.nonlinearity}(x) + I, mu = ${record.mu}, N = ${record.n}`,
      `# stable = ${row.stable}, index = ${row.index}, max Re lambda = ${row.maxRealPart}, residual = ${row.residual}, basin share = ${row.basinShare}`, "unit,x"];
    return { fileName, body: `${header.join("\n")}\n${x.map((v, i) => `${i},${v}`).join("\n")}\n` };
  }

  /** Deletes the probe (its owner only); a running search finds it gone and stops there. */
  async remove(actor: Reader, id: string): Promise<void> {
    const { access } = await this.getReadable(actor, id);
    if (access !== "owner") throw new ForbiddenError("Only the probe's owner deletes it");
    await repo.deleteProbe(this.deps.db, id);
  }
}

export function createProbesService(deps: ProbesServiceDeps): ProbesService {
  return new ProbesService(deps);
}
