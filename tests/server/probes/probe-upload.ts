import { readFileSync } from "node:fs";
import path from "node:path";
import type { TestClient, TestResponse } from "../../helpers/http-client";

// Multipart uploads to POST /api/probes from a test client's cookie jar (the JSON test client
// sends no form data).

export const FIXTURES = path.resolve(import.meta.dirname, "../../fixtures/probes");

export interface UploadPart {
  /** Form field: "matrix" or "input" (or anything, to test refusals). */
  field: string;
  name: string;
  bytes: Uint8Array;
}

/** A fixture file as an upload part. */
export function fixture(name: string, field = "matrix"): UploadPart {
  return { field, name, bytes: readFileSync(path.join(FIXTURES, name)) };
}

/** Sends files and text fields as multipart/form-data, signed in as `client`. */
export async function uploadProbe(baseUrl: string, client: TestClient | null, parts: UploadPart[], fields: Record<string, string> = { mu: "1" }): Promise<TestResponse> {
  const form = new FormData();
  for (const [k, v] of Object.entries(fields)) form.set(k, v);
  for (const p of parts) form.append(p.field, new Blob([new Uint8Array(p.bytes)]), p.name);
  const headers: Record<string, string> = {};
  if (client && client.jar.size > 0) headers.cookie = [...client.jar].map(([k, v]) => `${k}=${v}`).join("; ");
  const res = await fetch(`${baseUrl}/api/probes`, { method: "POST", body: form, headers });
  const text = await res.text();
  let body: unknown = null;
  try {
    body = text ? JSON.parse(text) : null;
  } catch {
    body = text;
  }
  return { status: res.status, headers: res.headers, body };
}
