import { useSyncExternalStore } from "react";
import { cn } from "../../lib/cn";
import { dismissToast, getToasts, subscribeToasts, type ToastTone } from "../../lib/toast-store";

const toneClass: Record<ToastTone, string> = {
  success: "border-l-moss-600",
  error: "border-l-rose-600",
  info: "border-l-well-500",
};

/** Renders the toast queue in one live region, bottom-right on desktop, full width on phones. */
export function Toaster() {
  const toasts = useSyncExternalStore(subscribeToasts, getToasts, getToasts);
  return (
    <div
      aria-live="polite"
      className="pointer-events-none fixed inset-x-3 bottom-3 z-50 flex flex-col items-stretch gap-2 sm:inset-x-auto sm:right-5 sm:bottom-5 sm:w-96"
    >
      {toasts.map((t) => (
        <div
          key={t.id}
          role={t.tone === "error" ? "alert" : "status"}
          className={cn(
            "pointer-events-auto flex items-start gap-3 rounded-lg border-l-4 bg-well-900 px-4 py-3 text-sm text-white shadow-[var(--shadow-pop)]",
            toneClass[t.tone],
          )}
        >
          <p className="flex-1 leading-snug">{t.message}</p>
          <button
            type="button"
            onClick={() => dismissToast(t.id)}
            className="-mr-1 rounded px-1 text-well-200 hover:text-white"
            aria-label="Dismiss"
          >
            ×
          </button>
        </div>
      ))}
    </div>
  );
}
