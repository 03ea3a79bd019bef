/** Search and paging of an admin list, kept in the address bar (`?q=…&offset=…`). */
export type ListParams = { q?: string; offset?: number; limit: number };

export function readListParams(search: URLSearchParams, limit: number): ListParams {
  const q = search.get("q")?.trim() || undefined;
  const raw = Number(search.get("offset") ?? 0);
  const offset = Number.isInteger(raw) && raw > 0 ? raw : undefined;
  return { q, offset, limit };
}

export function writeListParams(params: Omit<ListParams, "limit">): URLSearchParams {
  const out = new URLSearchParams();
  if (params.q) out.set("q", params.q);
  if (params.offset) out.set("offset", String(params.offset));
  return out;
}
