import type { GroupRole } from "../../../../shared/schemas";
import { Badge, type BadgeTone } from "../../../components/ui/badge";

const tone: Record<GroupRole, BadgeTone> = { owner: "ember", editor: "well", viewer: "plain" };

export const roleLabel: Record<GroupRole, string> = { owner: "Owner", editor: "Editor", viewer: "Viewer" };

export const roleDescription: Record<GroupRole, string> = {
  owner: "manages members and roles",
  editor: "creates maps and invites",
  viewer: "reads the group's maps",
};

export function RoleBadge({ role }: { role: GroupRole }) {
  return <Badge tone={tone[role]}>{roleLabel[role]}</Badge>;
}
