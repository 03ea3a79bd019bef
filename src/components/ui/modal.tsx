import { useEffect, useId, useRef, type ReactNode } from "react";

/**
 * A modal panel: focus moves into it and returns on close; Escape or the backdrop closes it.
 * (The native <dialog> element is not available in the test DOM, so this is a small div.)
 */
export function Modal({ title, onClose, children }: { title: string; onClose: () => void; children: ReactNode }) {
  const id = useId();
  const panel = useRef<HTMLDivElement>(null);
  useEffect(() => {
    const before = document.activeElement as HTMLElement | null;
    panel.current?.querySelector<HTMLElement>("input, select, button, a[href]")?.focus();
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && onClose();
    document.addEventListener("keydown", onKey);
    return () => {
      document.removeEventListener("keydown", onKey);
      before?.focus?.();
    };
  }, [onClose]);
  return (
    <div className="fixed inset-0 z-40 flex items-end justify-center bg-well-900/40 p-3 sm:items-center" onMouseDown={(e) => e.target === e.currentTarget && onClose()}>
      <div ref={panel} role="dialog" aria-modal="true" aria-labelledby={id} className="w-full max-w-lg rounded-[var(--radius-card)] bg-surface shadow-[var(--shadow-pop)] ring-1 ring-line">
        <div className="flex items-center justify-between border-b border-line px-5 py-3.5">
          <h2 id={id} className="text-base font-semibold text-ink">
            {title}
          </h2>
          <button type="button" onClick={onClose} aria-label="Close" className="rounded px-2 text-lg text-ink-faint hover:text-ink">
            ×
          </button>
        </div>
        <div className="px-5 py-4">{children}</div>
      </div>
    </div>
  );
}
