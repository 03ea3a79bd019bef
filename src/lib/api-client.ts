// The client's one door to the server: JSON in and out, cookies same-origin, and every
// failure turned into an ApiError carrying the server's `{ error: { code, message, issues } }`.

/** One field problem reported by the server (a 422), with its dotted field path. */
export type FieldIssue = { path: string; message: string };

export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly issues: FieldIssue[];

  constructor(status: number, code: string, message: string, issues: FieldIssue[] = []) {
    super(message);
    this.name = "ApiError";
    this.status = status;
    this.code = code;
    this.issues = issues;
  }
}

export function isApiError(error: unknown): error is ApiError {
  return error instanceof ApiError;
}

function issuePath(path: unknown): string {
  if (Array.isArray(path)) return path.map(String).join(".");
  return typeof path === "string" ? path : "";
}

function toApiError(status: number, body: unknown, statusText: string): ApiError {
  const err = (body as { error?: { code?: unknown; message?: unknown; issues?: unknown } } | null)?.error;
  if (!err || typeof err !== "object") {
    const message = status >= 500 ? "The server could not answer. Try again in a moment." : statusText || `HTTP ${status}`;
    return new ApiError(status, status >= 500 ? "internal" : "http_error", message);
  }
  const issues = Array.isArray(err.issues)
    ? err.issues.map((i: { path?: unknown; message?: unknown }) => ({
        path: issuePath(i?.path),
        message: String(i?.message ?? "Invalid value"),
      }))
    : [];
  return new ApiError(status, String(err.code ?? "error"), String(err.message ?? statusText), issues);
}

type RequestOptions = { signal?: AbortSignal };

async function request<T>(method: string, path: string, body?: unknown, opts: RequestOptions = {}): Promise<T> {
  let response: Response;
  // A FormData body goes as multipart/form-data; the browser writes its Content-Type (boundary).
  const form = body instanceof FormData;
  try {
    response = await fetch(path, {
      method,
      credentials: "same-origin",
      headers: body === undefined || form ? { Accept: "application/json" } : { Accept: "application/json", "Content-Type": "application/json" },
      body: body === undefined ? undefined : form ? body : JSON.stringify(body),
      signal: opts.signal,
    });
  } catch (cause) {
    if ((cause as Error)?.name === "AbortError") throw cause;
    throw new ApiError(0, "network", "Cannot reach the server. Check your connection and try again.");
  }
  const text = await response.text();
  let parsed: unknown = null;
  if (text) {
    try {
      parsed = JSON.parse(text);
    } catch {
      parsed = null;
    }
  }
  if (!response.ok) throw toApiError(response.status, parsed, response.statusText);
  return parsed as T;
}

export const api = {
  get: <T>(path: string, opts?: RequestOptions) => request<T>("GET", path, undefined, opts),
  post: <T>(path: string, body?: unknown, opts?: RequestOptions) => request<T>("POST", path, body ?? {}, opts),
  patch: <T>(path: string, body: unknown, opts?: RequestOptions) => request<T>("PATCH", path, body, opts),
  put: <T>(path: string, body: unknown, opts?: RequestOptions) => request<T>("PUT", path, body, opts),
  delete: <T>(path: string, opts?: RequestOptions) => request<T>("DELETE", path, undefined, opts),
  /** POST of files and fields as multipart/form-data. */
  upload: <T>(path: string, form: FormData, opts?: RequestOptions) => request<T>("POST", path, form, opts),
};
