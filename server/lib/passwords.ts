import argon2 from "argon2";

/** Hashes a password with argon2id at the library's default cost (64 MiB, 3 passes, 4 lanes). */
export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, { type: argon2.argon2id });
}

let decoy: Promise<string> | null = null;

/**
 * Checks `password` against `hash`. With `hash === null` (unknown account) it still verifies
 * against a decoy hash, so a wrong e-mail takes as long as a wrong password.
 */
export async function verifyPassword(hash: string | null, password: string): Promise<boolean> {
  if (hash === null) {
    decoy ??= hashPassword("decoy password that matches no account");
    await argon2.verify(await decoy, password);
    return false;
  }
  return argon2.verify(hash, password);
}
