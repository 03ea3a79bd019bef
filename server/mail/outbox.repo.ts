import { count, desc, ilike, or } from "drizzle-orm";
import type { Executor } from "../db/client";
import { containsPattern } from "../db/like";
import { outbox } from "../db/schema/index";

export interface OutboxInsert {
  to: string;
  from: string;
  subject: string;
  text: string;
  html: string | null;
}

export async function insertOutboxMessage(db: Executor, message: OutboxInsert): Promise<void> {
  await db.insert(outbox).values({
    to: message.to,
    from: message.from,
    subject: message.subject,
    text: message.text,
    html: message.html,
  });
}

/** Newest first; `q` matches recipient or subject (case-insensitive substring). */
export async function listOutboxMessages(db: Executor, page: { limit: number; offset: number; q?: string }) {
  const where = page.q ? or(ilike(outbox.to, containsPattern(page.q)), ilike(outbox.subject, containsPattern(page.q))) : undefined;
  const [items, [{ total }]] = await Promise.all([
    db.select().from(outbox).where(where).orderBy(desc(outbox.createdAt), desc(outbox.id)).limit(page.limit).offset(page.offset),
    db.select({ total: count() }).from(outbox).where(where),
  ]);
  return { items, total };
}
