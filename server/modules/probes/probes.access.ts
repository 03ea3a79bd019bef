import type { GroupRole } from "../../../shared/schemas/groups";
import type { ProbeAccess } from "../../../shared/schemas/probes";

/**
 * Who may do what with a probe:
 * - its owner: everything (read, search, delete);
 * - members of its group: owners and editors of the group read and run searches ("editor"),
 *   viewers only read;
 * - everybody else: nothing (the probe answers 404, as if it did not exist).
 */
export function probeAccessOf(probe: { ownerId: string; readerRole: GroupRole | null }, readerId: string): ProbeAccess | null {
  if (probe.ownerId === readerId) return "owner";
  if (probe.readerRole) return probe.readerRole === "viewer" ? "viewer" : "editor";
  return null;
}

/** Running a search: owners and the group's editors. */
export function canSearch(access: ProbeAccess): boolean {
  return access === "owner" || access === "editor";
}
