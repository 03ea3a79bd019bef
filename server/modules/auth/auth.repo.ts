import { and, eq, isNull, sql } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { passwordResetTokens, sessions, users } from "../../db/schema/index";

export type UserRow = typeof users.$inferSelect;

export async function findUserByEmail(db: Executor, email: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.email, email));
  return row;
}

export async function findUserById(db: Executor, id: string): Promise<UserRow | undefined> {
  const [row] = await db.select().from(users).where(eq(users.id, id));
  return row;
}

/** Inserts a user; returns undefined when the e-mail is taken (unique index). */
export async function insertUser(
  db: Executor,
  values: { email: string; name: string; passwordHash: string },
): Promise<UserRow | undefined> {
  const [row] = await db.insert(users).values(values).onConflictDoNothing({ target: users.email }).returning();
  return row;
}

export async function updatePasswordHash(db: Executor, userId: string, passwordHash: string): Promise<void> {
  await db.update(users).set({ passwordHash, updatedAt: new Date() }).where(eq(users.id, userId));
}

export async function insertResetToken(db: Executor, values: { userId: string; tokenHash: string; expiresAt: Date }) {
  await db.insert(passwordResetTokens).values(values);
}

/** Locks the token row for the rest of the transaction, so it is used at most once. */
export async function findResetTokenForUpdate(db: Executor, tokenHash: string) {
  const [row] = await db
    .select()
    .from(passwordResetTokens)
    .where(eq(passwordResetTokens.tokenHash, tokenHash))
    .for("update");
  return row;
}

/** Marks every unused token of the user as used (the one just redeemed and any older ones). */
export async function useResetTokensOf(db: Executor, userId: string): Promise<void> {
  await db
    .update(passwordResetTokens)
    .set({ usedAt: new Date() })
    .where(and(eq(passwordResetTokens.userId, userId), isNull(passwordResetTokens.usedAt)));
}

/** Signs the user out everywhere (after a password reset). */
export async function deleteSessionsOf(db: Executor, userId: string): Promise<void> {
  await db.delete(sessions).where(sql`${sessions.sess}->>'userId' = ${userId}`);
}
