/** What a test sees of one response: status, headers and the parsed JSON body (or null). */
export interface TestResponse<T = any> {
  status: number;
  headers: Headers;
  body: T;
}

export interface RequestOptions {
  headers?: Record<string, string>;
  /** A raw body sent as is (for malformed or oversized payloads). */
  raw?: string;
}

/**
 * A fetch client with a cookie jar, like one browser profile: cookies set by the server are
 * sent back on later requests. JSON bodies in and out.
 */
export function createClient(baseUrl: string) {
  const jar = new Map<string, string>();

  function remember(headers: Headers): void {
    for (const line of headers.getSetCookie()) {
      const [pair, ...attrs] = line.split(";");
      const eq = pair.indexOf("=");
      const name = pair.slice(0, eq).trim();
      const value = pair.slice(eq + 1).trim();
      const expired = attrs.some((a) => /^\s*expires=thu, 01 jan 1970/i.test(a)) || value === "";
      if (expired) jar.delete(name);
      else jar.set(name, value);
    }
  }

  async function request<T = any>(method: string, path: string, body?: unknown, options: RequestOptions = {}): Promise<TestResponse<T>> {
    const headers: Record<string, string> = { ...options.headers };
    if (jar.size > 0) headers.cookie = [...jar].map(([k, v]) => `${k}=${v}`).join("; ");
    let payload: string | undefined = options.raw;
    if (body !== undefined && payload === undefined) payload = JSON.stringify(body);
    if (payload !== undefined) headers["content-type"] ??= "application/json";
    const res = await fetch(`${baseUrl}${path}`, { method, headers, body: payload, redirect: "manual" });
    remember(res.headers);
    const text = await res.text();
    let parsed: unknown = null;
    try {
      parsed = text ? JSON.parse(text) : null;
    } catch {
      parsed = text;
    }
    return { status: res.status, headers: res.headers, body: parsed as T };
  }

  return {
    jar,
    /** The value of one cookie in the jar. */
    cookie: (name: string) => jar.get(name),
    get: <T = any>(path: string, o?: RequestOptions) => request<T>("GET", path, undefined, o),
    post: <T = any>(path: string, body?: unknown, o?: RequestOptions) => request<T>("POST", path, body, o),
    patch: <T = any>(path: string, body?: unknown, o?: RequestOptions) => request<T>("PATCH", path, body, o),
    delete: <T = any>(path: string, o?: RequestOptions) => request<T>("DELETE", path, undefined, o),
  };
}

export type TestClient = ReturnType<typeof createClient>;
