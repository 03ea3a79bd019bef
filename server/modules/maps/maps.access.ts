import { timingSafeEqual } from "node:crypto";
import type { GroupRole } from "../../../shared/schemas/groups";
import type { Visibility } from "../../../shared/schemas/maps";

/**
 * Who may do what with a map:
 * - its owner: everything;
 * - members of its group, when visibility is "group" or "link": owners and editors of the group
 *   read, update, cancel and share ("editor" access); viewers only read;
 * - anyone holding the map's share token, while visibility is not "private": read only ("link");
 * - everybody else: nothing (the map answers 404, as if it did not exist).
 * Deleting and moving a map to another group stay with its owner.
 */
export type MapAccess = "owner" | "editor" | "viewer" | "link";

export interface AccessFacts {
  ownerId: string;
  visibility: Visibility;
  shareToken: string | null;
  /** The reader's role in the map's group (null: not a member, or no group). */
  readerRole: GroupRole | null;
}

function sameToken(a: string, b: string): boolean {
  const x = Buffer.from(a);
  const y = Buffer.from(b);
  return x.length === y.length && timingSafeEqual(x, y);
}

/**
 * The access a reader has to a map.
 * @param map owner, visibility, share token and the reader's group role
 * @param readerId the signed-in account (null: signed out)
 * @param token the `?share=` token the request carries, if any
 * @returns the access, or null when the reader may not see the map
 */
export function accessOf(map: AccessFacts, readerId: string | null, token?: string): MapAccess | null {
  if (readerId && readerId === map.ownerId) return "owner";
  if (readerId && map.visibility !== "private" && map.readerRole) {
    return map.readerRole === "viewer" ? "viewer" : "editor";
  }
  if (token && map.shareToken && map.visibility !== "private" && sameToken(token, map.shareToken)) return "link";
  return null;
}

/** Update, cancel and share: owners and the group's editors. */
export function canWrite(access: MapAccess): boolean {
  return access === "owner" || access === "editor";
}
