/**
 * A small least-recently-used cache (a Map keeps insertion order: a hit is re-inserted at the
 * end, and the first key is the oldest). Values may be promises, so concurrent identical
 * requests share one computation; callers drop rejected entries with `delete`.
 */
export class LruCache<V> {
  private readonly map = new Map<string, V>();

  constructor(readonly capacity: number) {
    if (!Number.isSafeInteger(capacity) || capacity < 1) {
      throw new RangeError(`capacity must be a positive integer, got ${capacity}`);
    }
  }

  get size(): number {
    return this.map.size;
  }

  get(key: string): V | undefined {
    const value = this.map.get(key);
    if (value === undefined) return undefined;
    this.map.delete(key);
    this.map.set(key, value);
    return value;
  }

  set(key: string, value: V): void {
    this.map.delete(key);
    this.map.set(key, value);
    while (this.map.size > this.capacity) this.map.delete(this.map.keys().next().value as string);
  }

  delete(key: string): void {
    this.map.delete(key);
  }
}

/** Cache key of a parsed query: its entries sorted by name, so key order never matters. */
export function normalizedKey(route: string, query: Record<string, unknown>): string {
  const entries = Object.entries(query).sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
  return `${route}?${JSON.stringify(entries)}`;
}
