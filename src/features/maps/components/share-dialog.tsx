import { useState } from "react";
import { pagePaths } from "../../../../shared/schemas/api-paths";
import type { MapView, Visibility } from "../../../../shared/schemas/maps";
import { Button } from "../../../components/ui/button";
import { controlClass, FormMessage, SelectField } from "../../../components/ui/field";
import { isApiError } from "../../../lib/api-client";
import { toast } from "../../../lib/toast-store";
import { useRevokeShareLink, useShareLink, useUpdateMap } from "../api/map-mutations";
import { Modal } from "../../../components/ui/modal";

const CHOICES: { value: Visibility; label: string; help: string }[] = [
  { value: "private", label: "Private", help: "Only you." },
  { value: "group", label: "Group", help: "Members of the group read it; its editors and owners may also change, cancel and share it." },
  { value: "link", label: "Anyone with the link", help: "A read-only link: whoever has it sees the map and its cells, signed in or not. Nobody can change anything through it." },
];

function LinkBox({ map }: { map: MapView }) {
  const revoke = useRevokeShareLink(map.id);
  if (!map.shareToken) return null;
  const url = `${window.location.origin}${pagePaths.sharedMap(map.shareToken)}`;
  const copy = () =>
    navigator.clipboard?.writeText(url).then(
      () => toast.success("Link copied."),
      () => toast.error("Copying was refused by the browser: select the link and copy it by hand."),
    );
  return (
    <div className="flex flex-col gap-2 rounded-lg bg-well-50 p-3 ring-1 ring-well-100">
      <label className="text-sm font-medium text-ink" htmlFor="share-link">
        Read-only link
      </label>
      <input id="share-link" readOnly value={url} onFocus={(e) => e.target.select()} className={controlClass(false)} />
      <div className="flex flex-wrap gap-2">
        <Button size="sm" onClick={copy}>
          Copy link
        </Button>
        <Button size="sm" variant="ghost" busy={revoke.isPending} onClick={() => revoke.mutate()}>
          Revoke link
        </Button>
      </div>
    </div>
  );
}

/** Who may read the map (private, a group, anyone with a read-only link) and the link itself. */
export function ShareDialog({ map, groups, onClose }: { map: MapView; groups: { id: string; name: string }[]; onClose: () => void }) {
  const [visibility, setVisibility] = useState<Visibility>(map.visibility);
  const [groupId, setGroupId] = useState(map.groupId ?? groups[0]?.id ?? "");
  const [error, setError] = useState<string>();
  const update = useUpdateMap(map.id);
  const link = useShareLink(map.id);
  const busy = update.isPending || link.isPending;

  const save = async () => {
    setError(undefined);
    if (visibility === "group" && !groupId) return setError("Choose a group, or join one first.");
    try {
      const changed = visibility !== map.visibility || (visibility === "group" && groupId !== map.groupId);
      if (changed) await update.mutateAsync({ visibility, groupId: visibility === "group" ? groupId : map.groupId });
      if (visibility === "link" && !map.shareToken) await link.mutateAsync();
    } catch (e) {
      setError(isApiError(e) ? e.message : "Saving failed.");
    }
  };

  return (
    <Modal title="Share this map" onClose={onClose}>
      <div className="flex flex-col gap-4">
        <FormMessage message={error} />
        <fieldset className="flex flex-col gap-2">
          <legend className="mb-1 text-sm font-medium text-ink">Who can open it</legend>
          {CHOICES.map((c) => (
            <label key={c.value} className="flex items-start gap-2.5 rounded-lg p-2 text-sm hover:bg-paper">
              <input type="radio" name="visibility" value={c.value} checked={visibility === c.value} onChange={() => setVisibility(c.value)} className="mt-0.5 h-4 w-4 accent-well-600" />
              <span>
                <span className="font-medium text-ink">{c.label}</span>
                <span className="block text-xs text-ink-soft">{c.help}</span>
              </span>
            </label>
          ))}
        </fieldset>
        {visibility === "group" &&
          (groups.length ? (
            <SelectField label="Group" value={groupId} onChange={(e) => setGroupId(e.target.value)} options={groups.map((g) => ({ value: g.id, label: g.name }))} />
          ) : (
            <p className="text-sm text-ink-soft">You are in no group yet. Create one on the Groups page first.</p>
          ))}
        <div className="flex justify-end gap-2">
          <Button variant="secondary" onClick={onClose}>
            Close
          </Button>
          <Button onClick={save} busy={busy}>
            {visibility === "link" && !map.shareToken ? "Save and create link" : "Save"}
          </Button>
        </div>
        <LinkBox map={map} />
      </div>
    </Modal>
  );
}
