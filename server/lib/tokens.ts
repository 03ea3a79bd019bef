import { createHash, randomBytes } from "node:crypto";

/** SHA-256 (hex) of a link token; the database stores only this. */
export function hashToken(token: string): string {
  return createHash("sha256").update(token, "utf8").digest("hex");
}

/** A fresh random link token (32 bytes from crypto.randomBytes, base64url) and its hash. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: hashToken(token) };
}
