import { describe, expect, it } from "vitest";
import { LruCache, normalizedKey } from "../../../server/modules/theory/theory.cache";

describe("LruCache", () => {
  it("evicts the least recently used key and refreshes on get", () => {
    const cache = new LruCache<number>(2);
    cache.set("a", 1);
    cache.set("b", 2);
    expect(cache.get("a")).toBe(1); // a is now the most recent
    cache.set("c", 3);
    expect(cache.get("b")).toBeUndefined();
    expect(cache.get("a")).toBe(1);
    expect(cache.get("c")).toBe(3);
    expect(cache.size).toBe(2);
    expect(() => new LruCache(0)).toThrow(RangeError);
  });

  it("keys a query by sorted entries, so key order does not matter", () => {
    expect(normalizedKey("field", { N: 3, mu: 1 })).toBe(normalizedKey("field", { mu: 1, N: 3 }));
    expect(normalizedKey("field", { N: 3 })).not.toBe(normalizedKey("rate", { N: 3 }));
  });
});
