import pg from "pg";
import type { CellSummary } from "../../../shared/maps/cell-summary";
import type { MapStatusEvent } from "../../../shared/maps/map-events";
import type { Db } from "../../db/client";
import type { Logger } from "../../lib/logger";
import { listCellSummaries, type SummaryFilter } from "../cells/cell-summaries.repo";
import { MAP_EVENTS_CHANNEL, mapNotificationSchema, type MapNotification } from "../cells/map-notify.repo";
import { readMapProgress, type MapProgress } from "../cells/map-progress.repo";

/** What a subscriber of one map hears. */
export type MapEvent =
  | { type: "cell"; data: CellSummary }
  | { type: "progress"; data: MapProgress }
  | { type: "status"; data: MapStatusEvent };
export type MapEventListener = (event: MapEvent) => void;

export interface MapEventsHubDeps {
  db: Db;
  /** The process's pool: the listener opens its own connection with the pool's settings. */
  pool: pg.Pool;
  logger: Logger;
  /** Milliseconds before reconnecting a lost LISTEN connection (default 1000, doubling to 30 s). */
  reconnectMs?: number;
  /**
   * Milliseconds between checks of every subscribed map (default 5000): a change that came
   * without a notification (a write that does not notify, a notification lost while
   * reconnecting) still reaches subscribers as `progress` / `status`.
   */
  resyncMs?: number;
}

interface Topic {
  listeners: Set<MapEventListener>;
  lastStatus: string | null;
  /** Status and counters last sent as `progress`, to skip unchanged resyncs. */
  lastProgress: string | null;
  /** Notifications of one map are handled in order. */
  chain: Promise<void>;
}

function progressKey(p: MapProgress): string {
  return `${p.status}:${p.cellsDone}:${p.failure ?? ""}`;
}

/**
 * One LISTEN map_events connection per server process, fanned out to the subscribers of each
 * map. The connection opens with the first subscriber and reconnects (with back-off) while
 * anybody listens; after a reconnect every map gets a fresh `progress`, since notifications
 * sent while disconnected are lost, and every few seconds each subscribed map is checked for a
 * change no notification announced. Each notification is turned into events once per map,
 * however many subscribers it has.
 */
export class MapEventsHub {
  private readonly topics = new Map<string, Topic>();
  private client: pg.Client | null = null;
  private connecting: Promise<void> | null = null;
  private retryMs: number;
  private closed = false;
  private resync: NodeJS.Timeout | null = null;

  constructor(private readonly deps: MapEventsHubDeps) {
    this.retryMs = deps.reconnectMs ?? 1000;
  }

  /** Subscribes to a map's events; the returned function unsubscribes. */
  async subscribe(mapId: string, listener: MapEventListener): Promise<() => void> {
    if (this.closed) throw new Error("map events hub is closed");
    let topic = this.topics.get(mapId);
    if (!topic) {
      topic = { listeners: new Set(), lastStatus: null, lastProgress: null, chain: Promise.resolve() };
      this.topics.set(mapId, topic);
    }
    topic.listeners.add(listener);
    const unsubscribe = () => {
      topic.listeners.delete(listener);
      if (topic.listeners.size === 0 && this.topics.get(mapId) === topic) this.topics.delete(mapId);
    };
    this.resync ??= setInterval(() => this.resyncAll(), this.deps.resyncMs ?? 5000).unref();
    try {
      await this.ensureListening();
    } catch (err) {
      unsubscribe();
      throw err;
    }
    return unsubscribe;
  }

  /** Current progress and status of a map, as a new subscriber's first events. */
  async snapshot(mapId: string): Promise<MapEvent[]> {
    const progress = await readMapProgress(this.deps.db, mapId);
    if (!progress) return [];
    const topic = this.topics.get(mapId);
    if (topic) {
      topic.lastStatus = progress.status;
      topic.lastProgress = progressKey(progress);
    }
    return [{ type: "progress", data: progress }, { type: "status", data: { status: progress.status, failure: progress.failure } }];
  }

  /** Subscriber count (for tests and diagnostics). */
  get subscribers(): number {
    let n = 0;
    for (const t of this.topics.values()) n += t.listeners.size;
    return n;
  }

  async close(): Promise<void> {
    this.closed = true;
    if (this.resync) clearInterval(this.resync);
    this.topics.clear();
    const client = this.client;
    this.client = null;
    if (client) await client.end().catch(() => undefined);
  }

  private ensureListening(): Promise<void> {
    if (this.client) return Promise.resolve();
    this.connecting ??= this.connect().finally(() => (this.connecting = null));
    return this.connecting;
  }

  private async connect(): Promise<void> {
    const client = new pg.Client({ ...this.deps.pool.options, application_name: "equilibrist-map-events" });
    client.on("error", (err) => this.lost(client, err));
    client.on("end", () => this.lost(client, new Error("connection ended")));
    client.on("notification", (msg) => {
      if (msg.channel === MAP_EVENTS_CHANNEL && msg.payload) this.dispatch(msg.payload);
    });
    try {
      await client.connect();
      await client.query(`LISTEN ${MAP_EVENTS_CHANNEL}`);
    } catch (err) {
      await client.end().catch(() => undefined);
      throw err;
    }
    if (this.closed) {
      await client.end();
      return;
    }
    this.client = client;
    this.retryMs = this.deps.reconnectMs ?? 1000;
  }

  private lost(client: pg.Client, err: Error): void {
    if (this.client !== client || this.closed) return;
    this.client = null;
    this.deps.logger.warn("map events listener lost", { message: err.message });
    this.scheduleReconnect();
  }

  private scheduleReconnect(): void {
    const delay = this.retryMs;
    this.retryMs = Math.min(this.retryMs * 2, 30_000);
    setTimeout(() => void this.reconnect(), delay).unref();
  }

  private async reconnect(): Promise<void> {
    if (this.closed || this.topics.size === 0) return;
    try {
      await this.ensureListening();
    } catch (err) {
      this.deps.logger.warn("map events: reconnect failed", { message: (err as Error).message });
      this.scheduleReconnect();
      return;
    }
    // Notifications sent while disconnected are lost: give every map its current progress.
    for (const mapId of this.topics.keys()) this.enqueue(mapId, () => this.sendProgress(mapId));
  }

  private dispatch(payload: string): void {
    let note: MapNotification;
    try {
      note = mapNotificationSchema.parse(JSON.parse(payload));
    } catch {
      this.deps.logger.warn("map events: unreadable notification", { payload: payload.slice(0, 200) });
      return;
    }
    if ("theoryKey" in note) {
      for (const mapId of this.topics.keys()) this.enqueue(mapId, () => this.sendCells(mapId, { theoryKey: note.theoryKey }));
      return;
    }
    if (!this.topics.has(note.mapId)) return;
    if ("i" in note) this.enqueue(note.mapId, async () => (await this.sendCells(note.mapId, { i: note.i, j: note.j }), await this.sendProgress(note.mapId)));
    else this.enqueue(note.mapId, () => this.sendProgress(note.mapId));
  }

  private enqueue(mapId: string, work: () => Promise<unknown>): void {
    const topic = this.topics.get(mapId);
    if (!topic) return;
    topic.chain = topic.chain.then(work).then(
      () => undefined,
      (err: Error) => this.deps.logger.warn("map events: could not read the map", { mapId, message: err.message }),
    );
  }

  private emit(mapId: string, event: MapEvent): void {
    for (const listener of this.topics.get(mapId)?.listeners ?? []) listener(event);
  }

  private async sendCells(mapId: string, filter: SummaryFilter): Promise<void> {
    if (!this.topics.has(mapId)) return;
    for (const { summary } of await listCellSummaries(this.deps.db, mapId, filter)) this.emit(mapId, { type: "cell", data: summary });
  }

  private resyncAll(): void {
    for (const mapId of this.topics.keys()) this.enqueue(mapId, () => this.sendProgress(mapId, true));
  }

  /** Sends `progress` (when `onlyChanged`, only if status or counters moved) and `status` on a change. */
  private async sendProgress(mapId: string, onlyChanged = false): Promise<void> {
    const topic = this.topics.get(mapId);
    if (!topic) return;
    const progress = await readMapProgress(this.deps.db, mapId);
    if (!progress) return;
    const key = progressKey(progress);
    if (onlyChanged && key === topic.lastProgress) return;
    topic.lastProgress = key;
    this.emit(mapId, { type: "progress", data: progress });
    if (progress.status !== topic.lastStatus) {
      topic.lastStatus = progress.status;
      this.emit(mapId, { type: "status", data: { status: progress.status, failure: progress.failure } });
    }
  }
}

export function createMapEventsHub(deps: MapEventsHubDeps): MapEventsHub {
  return new MapEventsHub(deps);
}
