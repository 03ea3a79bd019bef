import type { ReactNode } from "react";
import { cn } from "../../lib/cn";

type EmptyStateProps = { title: string; children?: ReactNode; action?: ReactNode; className?: string };

/** What a list shows when it has nothing yet: a flat well with nothing settled in it. */
export function EmptyState({ title, children, action, className }: EmptyStateProps) {
  return (
    <div className={cn("flex flex-col items-center px-6 py-12 text-center", className)}>
      <svg viewBox="0 0 120 48" aria-hidden="true" className="mb-4 h-12 w-32 text-well-200">
        <path d="M4 14c18 0 26 22 56 22s38-22 56-22" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
        <circle cx="60" cy="27" r="6" fill="none" stroke="currentColor" strokeWidth="2.5" strokeDasharray="4 3" />
      </svg>
      <h3 className="text-base font-semibold text-ink">{title}</h3>
      {children && <div className="mt-1.5 max-w-md text-sm text-ink-soft">{children}</div>}
      {action && <div className="mt-5">{action}</div>}
    </div>
  );
}
