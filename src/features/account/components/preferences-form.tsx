import type { Preferences } from "../../../../shared/schemas/account";

interface PreferencesFormProps {
  preferences: Preferences;
  busy: boolean;
  onChange: (patch: Partial<Preferences>) => void;
}

/** The account's switches; each saves as soon as it changes. */
export function PreferencesForm({ preferences, busy, onChange }: PreferencesFormProps) {
  return (
    <fieldset aria-busy={busy || undefined} className="flex flex-col gap-3">
      <legend className="sr-only">E-mail</legend>
      <label className="flex cursor-pointer items-start gap-3">
        <input
          type="checkbox"
          className="mt-1 h-4 w-4 accent-well-700"
          checked={preferences.notifyMapFinished}
          onChange={(e) => onChange({ notifyMapFinished: e.target.checked })}
        />
        <span>
          <span className="block text-sm font-medium text-ink">E-mail me when a map finishes</span>
          <span className="block text-sm text-ink-soft">
            One message per map you own, when its last cell is done, with a link to the map.
          </span>
        </span>
      </label>
    </fieldset>
  );
}
