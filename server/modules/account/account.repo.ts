import { eq } from "drizzle-orm";
import type { Executor } from "../../db/client";
import { maps, users } from "../../db/schema/index";

/** The account's preferences (undefined when the account does not exist). */
export async function findPreferences(db: Executor, userId: string): Promise<{ notifyMapFinished: boolean } | undefined> {
  const [row] = await db.select({ notifyMapFinished: users.notifyMapFinished }).from(users).where(eq(users.id, userId));
  return row;
}

export async function updatePreferences(db: Executor, userId: string, patch: { notifyMapFinished?: boolean }): Promise<void> {
  await db.update(users).set({ ...patch, updatedAt: new Date() }).where(eq(users.id, userId));
}

/** The owner of a map, with their notify preference, and the map's title (undefined: no such map). */
export async function findMapOwnerContact(db: Executor, mapId: string) {
  const [row] = await db
    .select({ email: users.email, name: users.name, notifyMapFinished: users.notifyMapFinished, title: maps.title })
    .from(maps)
    .innerJoin(users, eq(users.id, maps.ownerId))
    .where(eq(maps.id, mapId));
  return row;
}
