import {
  QUEUE_HISTORY_HOURS,
  type AdminGroupList,
  type AdminQueue,
  type AdminUser,
  type AdminUserList,
  type ChangeSiteRole,
  type OutboxList,
} from "../../../shared/schemas/admin";
import type { PageQuery } from "../../../shared/schemas/common";
import type { Db } from "../../db/client";
import { requireActor, type Actor } from "../../lib/actor";
import { iso } from "../../lib/dto";
import { ConflictError, ForbiddenError, NotFoundError } from "../../lib/errors";
import { listOutboxMessages } from "../../mail/outbox.repo";
import * as queueRepo from "./admin-queue.repo";
import * as repo from "./admin.repo";

/** Throws unless the actor is signed in with site role admin. */
export function requireAdmin(actor: Actor | null | undefined): Actor {
  const me = requireActor(actor);
  if (me.siteRole !== "admin") throw new ForbiddenError("This needs the site admin role");
  return me;
}

/** Site administration: accounts, groups, the outbox, the compute queue. Site admins only. */
export class AdminService {
  private readonly db: Db;

  constructor(deps: { db: Db }) {
    this.db = deps.db;
  }

  async listUsers(actor: Actor | null | undefined, query: PageQuery): Promise<AdminUserList> {
    requireAdmin(actor);
    const { items, total } = await repo.listUsers(this.db, query);
    return { items: items.map((u) => ({ ...u, createdAt: iso(u.createdAt) })), total };
  }

  /** Changes a user's site role; the last admin cannot be demoted. */
  async changeSiteRole(actor: Actor | null | undefined, userId: string, input: ChangeSiteRole): Promise<AdminUser> {
    requireAdmin(actor);
    return this.db.transaction(async (tx) => {
      const admins = await repo.lockAdmins(tx);
      const target = await repo.findUser(tx, userId);
      if (!target) throw new NotFoundError("User not found");
      if (target.siteRole === "admin" && input.siteRole !== "admin" && admins <= 1) {
        throw new ConflictError("The site needs at least one admin: make someone else an admin first");
      }
      await repo.setSiteRole(tx, userId, input.siteRole);
      const row = await repo.findAdminUser(tx, userId);
      if (!row) throw new NotFoundError("User not found");
      return { ...row, createdAt: iso(row.createdAt) };
    });
  }

  async listGroups(actor: Actor | null | undefined, query: PageQuery): Promise<AdminGroupList> {
    requireAdmin(actor);
    const { items, total } = await repo.listGroups(this.db, query);
    return { items: items.map((g) => ({ ...g, createdAt: iso(g.createdAt) })), total };
  }

  /** The e-mails the local SMTP fake caught, newest first. */
  async listOutbox(actor: Actor | null | undefined, query: PageQuery): Promise<OutboxList> {
    requireAdmin(actor);
    const { items, total } = await listOutboxMessages(this.db, query);
    return { items: items.map((m) => ({ ...m, createdAt: iso(m.createdAt) })), total };
  }

  /**
   * The compute queue as pg-boss holds it (jobs per queue and state; finished ones over the last
   * QUEUE_HISTORY_HOURS), the jobs running now, the workers that stored cells recently, and the
   * maps still queued or running.
   */
  async queueOverview(actor: Actor | null | undefined): Promise<AdminQueue> {
    requireAdmin(actor);
    const [queues, active, workers, inFlight] = await Promise.all([
      queueRepo.countJobsByQueue(this.db, QUEUE_HISTORY_HOURS),
      queueRepo.listActiveJobs(this.db, queueRepo.QUEUE_LIST_LIMIT),
      queueRepo.listWorkers(this.db, QUEUE_HISTORY_HOURS),
      queueRepo.listInFlightMaps(this.db, queueRepo.QUEUE_LIST_LIMIT),
    ]);
    return {
      queues,
      activeJobs: active.map(({ startedMs, ...job }) => ({ ...job, startedOn: iso(new Date(startedMs)) })),
      workers: workers.flatMap((w) => (w.lastCellAt ? [{ ...w, lastCellAt: iso(w.lastCellAt) }] : [])),
      inFlightMaps: inFlight.map((m) => ({ ...m, status: m.status === "running" ? "running" : "queued" })),
    };
  }
}

export function createAdminService(deps: { db: Db }): AdminService {
  return new AdminService(deps);
}
