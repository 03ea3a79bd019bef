import type { ReactNode } from "react";
import { cn } from "../../lib/cn";

export type BadgeTone = "well" | "ember" | "moss" | "rose" | "plain";

const tones: Record<BadgeTone, string> = {
  well: "bg-well-50 text-well-700 ring-well-100",
  ember: "bg-ember-50 text-ember-700 ring-ember-100",
  moss: "bg-moss-50 text-moss-700 ring-moss-100",
  rose: "bg-rose-50 text-rose-700 ring-rose-100",
  plain: "bg-paper text-ink-soft ring-line",
};

export function Badge({ tone = "plain", children, className }: { tone?: BadgeTone; children: ReactNode; className?: string }) {
  return (
    <span
      className={cn(
        "inline-flex items-center rounded-full px-2 py-0.5 text-xs font-medium ring-1 ring-inset",
        tones[tone],
        className,
      )}
    >
      {children}
    </span>
  );
}
