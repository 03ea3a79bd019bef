import { and, eq } from "drizzle-orm";
import type { GroupRole } from "../../../shared/schemas/groups";
import type { SiteRole } from "../../../shared/schemas/auth";
import type { Db } from "../client";
import { groupMembers, groups, users } from "../schema/index";
import { hashPassword } from "../../lib/passwords";

/** The invented demo lab: its people, their site roles and their roles in the lab's group. */
export const DEMO_PASSWORD = "tessellate-demo-42";
export const DEMO_GROUP = "Quillfeather Attractor Lab";

export const demoPeople: { email: string; name: string; siteRole: SiteRole; groupRole: GroupRole | null; about: string }[] = [
  { email: "ines.marwick@quillfeather.example", name: "Ines Marwick", siteRole: "admin", groupRole: "owner", about: "lab head, site admin" },
  { email: "tobin.achterberg@quillfeather.example", name: "Tobin Achterberg", siteRole: "member", groupRole: "editor", about: "postdoc, editor" },
  { email: "sunniva.okafor@quillfeather.example", name: "Sunniva Okafor", siteRole: "member", groupRole: "viewer", about: "PhD student, viewer" },
  { email: "rafferty.lindqvist@quillfeather.example", name: "Rafferty Lindqvist", siteRole: "member", groupRole: null, about: "teaching assistant, no group yet" },
];

/**
 * Inserts the demo lab if missing and leaves existing rows (and changed passwords) alone, so it
 * can run on every start. Returns the people with whether each was created now.
 */
export async function seedDemoLab(db: Db): Promise<{ email: string; about: string; created: boolean }[]> {
  const passwordHash = await hashPassword(DEMO_PASSWORD);
  const out: { email: string; about: string; created: boolean }[] = [];
  await db.transaction(async (tx) => {
    const ids = new Map<string, string>();
    for (const p of demoPeople) {
      const [inserted] = await tx
        .insert(users)
        .values({ email: p.email, name: p.name, siteRole: p.siteRole, passwordHash })
        .onConflictDoNothing({ target: users.email })
        .returning({ id: users.id });
      const [row] = inserted ? [inserted] : await tx.select({ id: users.id }).from(users).where(eq(users.email, p.email));
      ids.set(p.email, row.id);
      out.push({ email: p.email, about: p.about, created: inserted !== undefined });
    }
    const headId = ids.get(demoPeople[0].email)!;
    let [group] = await tx.select({ id: groups.id }).from(groups).where(and(eq(groups.name, DEMO_GROUP), eq(groups.createdBy, headId)));
    if (!group) [group] = await tx.insert(groups).values({ name: DEMO_GROUP, createdBy: headId }).returning({ id: groups.id });
    for (const p of demoPeople) {
      if (!p.groupRole) continue;
      await tx.insert(groupMembers).values({ groupId: group.id, userId: ids.get(p.email)!, role: p.groupRole }).onConflictDoNothing();
    }
  });
  return out;
}
