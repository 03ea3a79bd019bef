import { cn } from "../../lib/cn";
import { initials } from "../../lib/format";

/** Initials in a disc; the hue is picked from the name so people stay recognisable. */
export function Avatar({ name, className }: { name: string; className?: string }) {
  const hues = ["bg-well-100 text-well-800", "bg-ember-100 text-ember-700", "bg-moss-100 text-moss-700", "bg-rose-100 text-rose-700"];
  let hash = 0;
  for (const ch of name) hash = (hash * 31 + ch.charCodeAt(0)) >>> 0;
  return (
    <span
      aria-hidden="true"
      className={cn(
        "inline-flex h-9 w-9 shrink-0 items-center justify-center rounded-full text-xs font-semibold",
        hues[hash % hues.length],
        className,
      )}
    >
      {initials(name)}
    </span>
  );
}
