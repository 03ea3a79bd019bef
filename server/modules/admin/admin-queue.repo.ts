import { asc, desc, eq, inArray, max, sql } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { cells, maps, users } from "../../db/schema/index";
import { FILL_CELL_EXHAUSTED_QUEUE, FILL_CELL_QUEUE } from "../../queue/queues";

// Reads for the admin queue view. pg-boss 10 keeps jobs in pgboss.job (one partition per queue)
// and moves finished jobs to pgboss.archive after 12 hours by default, so finished counts read
// both. pg-boss's schema exists once any process has started it; before that there is no queue.
// pg-boss's own queues (named __pgboss__…, e.g. the cron sender) are left out.

const internalQueue = (name: string) => sql`starts_with(${sql.raw(name)}, '__pgboss__')`;

/** Most active jobs and in-flight maps listed (the per-queue counts are complete). */
export const QUEUE_LIST_LIMIT = 200;

export type QueueCountRow = {
  name: string;
  created: number;
  retry: number;
  active: number;
  completed: number;
  failed: number;
  cancelled: number;
};

export type ActiveJobRow = {
  id: string;
  queue: string;
  mapId: string | null;
  mapTitle: string | null;
  i: number | null;
  j: number | null;
  startedMs: number;
  retryCount: number;
};

async function hasBossSchema(db: Executor): Promise<boolean> {
  const { rows } = await db.execute<{ ok: boolean }>(
    sql`select to_regclass('pgboss.job') is not null and to_regclass('pgboss.archive') is not null and to_regclass('pgboss.queue') is not null as ok`,
  );
  return rows[0]?.ok === true;
}

/** Jobs per queue and state: waiting and running now, finished within the last `hours`. */
export async function countJobsByQueue(db: Executor, hours: number): Promise<QueueCountRow[]> {
  if (!(await hasBossSchema(db))) return [];
  const since = sql`now() - make_interval(hours => ${hours})`;
  const { rows } = await db.execute<QueueCountRow>(sql`
    with counted as (
      select name, state::text as state, count(*)::int as n from pgboss.job
        where state in ('created', 'retry', 'active') or (state in ('completed', 'failed', 'cancelled') and completed_on > ${since})
        group by name, state
      union all
      select name, state::text as state, count(*)::int as n from pgboss.archive
        where state in ('completed', 'failed', 'cancelled') and completed_on > ${since}
        group by name, state
    )
    select q.name,
      ${stateSum("created")} as created, ${stateSum("retry")} as retry, ${stateSum("active")} as active,
      ${stateSum("completed")} as completed, ${stateSum("failed")} as failed, ${stateSum("cancelled")} as cancelled
    from pgboss.queue q left join counted c on c.name = q.name
    where not ${internalQueue("q.name")}
    group by q.name order by q.name`);
  return rows;
}

function stateSum(state: string) {
  return sql`coalesce(sum(c.n) filter (where c.state = ${state}), 0)::int`;
}

/** Active jobs, oldest start first; fill-cell jobs carry their map and grid position. */
export async function listActiveJobs(db: Executor, limit: number): Promise<ActiveJobRow[]> {
  if (!(await hasBossSchema(db))) return [];
  const cellQueues = sql`(${FILL_CELL_QUEUE}, ${FILL_CELL_EXHAUSTED_QUEUE})`;
  const { rows } = await db.execute<ActiveJobRow>(sql`
    select j.id::text as id, j.name as queue, m.id::text as "mapId", m.title as "mapTitle",
      case when j.name in ${cellQueues} then (j.data->>'i')::int end as i,
      case when j.name in ${cellQueues} then (j.data->>'j')::int end as j,
      (extract(epoch from j.started_on) * 1000)::float8 as "startedMs", j.retry_count as "retryCount"
    from pgboss.job j left join ${maps} m on m.id::text = j.data->>'mapId'
    where j.state = 'active' and not ${internalQueue("j.name")}
    order by j.started_on, j.id limit ${limit}`);
  return rows;
}

/** Workers that stored a cell within the last `hours`, most recent first. */
export async function listWorkers(db: Executor, hours: number) {
  return db
    .select({
      name: cells.worker,
      cellsLastHour: sql<number>`(count(*) filter (where ${cells.createdAt} > now() - interval '1 hour'))::int`,
      lastCellAt: max(cells.createdAt),
    })
    .from(cells)
    .where(sql`${cells.createdAt} > now() - make_interval(hours => ${hours})`)
    .groupBy(cells.worker)
    .orderBy(desc(max(cells.createdAt)), asc(cells.worker));
}

/** Maps queued or running, oldest first, with the owner's name. */
export async function listInFlightMaps(db: Executor, limit: number) {
  return db
    .select({ id: maps.id, title: maps.title, ownerName: users.name, status: maps.status, cellsDone: maps.cellsDone, cellsTotal: maps.cellsTotal })
    .from(maps)
    .innerJoin(users, eq(users.id, maps.ownerId))
    .where(inArray(maps.status, ["queued", "running"]))
    .orderBy(asc(maps.createdAt), asc(maps.id))
    .limit(limit);
}
