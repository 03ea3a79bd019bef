import { useEffect, useId, useRef, useState } from "react";
import { useNavigate } from "react-router-dom";
import type { User } from "../../../shared/schemas";
import { Avatar } from "../../components/ui/avatar";
import { Badge } from "../../components/ui/badge";
import { useSignOut } from "../../features/auth/api/auth-mutations";

/** The signed-in person's corner: who they are, and the way out. */
export function AccountMenu({ user }: { user: User }) {
  const [open, setOpen] = useState(false);
  const menuId = useId();
  const rootRef = useRef<HTMLDivElement>(null);
  const signOut = useSignOut();
  const navigate = useNavigate();

  useEffect(() => {
    if (!open) return;
    const onPointer = (e: PointerEvent) => {
      if (!rootRef.current?.contains(e.target as Node)) setOpen(false);
    };
    const onKey = (e: KeyboardEvent) => e.key === "Escape" && setOpen(false);
    document.addEventListener("pointerdown", onPointer);
    document.addEventListener("keydown", onKey);
    return () => {
      document.removeEventListener("pointerdown", onPointer);
      document.removeEventListener("keydown", onKey);
    };
  }, [open]);

  const doSignOut = () => signOut.mutate(undefined, { onSuccess: () => navigate("/sign-in", { replace: true }) });

  return (
    <div ref={rootRef} className="relative">
      <button
        type="button"
        aria-haspopup="menu"
        aria-expanded={open}
        aria-controls={menuId}
        onClick={() => setOpen((o) => !o)}
        className="flex items-center gap-2 rounded-full py-1 pr-2 pl-1 text-sm text-well-100 hover:bg-well-800"
      >
        <Avatar name={user.name} className="h-8 w-8" />
        <span className="hidden max-w-40 truncate md:inline">{user.name}</span>
        <svg viewBox="0 0 12 12" aria-hidden="true" className="h-3 w-3 text-well-300">
          <path d="M2.5 4.5 6 8l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.6" strokeLinecap="round" />
        </svg>
        <span className="sr-only">Account menu</span>
      </button>
      {open && (
        <div
          id={menuId}
          role="menu"
          className="absolute right-0 z-40 mt-2 w-64 rounded-xl bg-surface p-1.5 text-ink shadow-[var(--shadow-pop)] ring-1 ring-line"
        >
          <div className="px-3 py-2.5">
            <p className="truncate text-sm font-semibold">{user.name}</p>
            <p className="truncate text-xs text-ink-soft">{user.email}</p>
            <Badge tone={user.siteRole === "admin" ? "ember" : "plain"} className="mt-2">
              {user.siteRole === "admin" ? "Site admin" : "Member"}
            </Badge>
          </div>
          <div className="my-1 h-px bg-line" />
          <button
            type="button"
            role="menuitem"
            onClick={() => {
              setOpen(false);
              navigate("/account");
            }}
            className="w-full rounded-lg px-3 py-2 text-left text-sm text-ink hover:bg-well-50"
          >
            Account settings
          </button>
          <button
            type="button"
            role="menuitem"
            onClick={doSignOut}
            disabled={signOut.isPending}
            className="w-full rounded-lg px-3 py-2 text-left text-sm text-ink hover:bg-well-50"
          >
            {signOut.isPending ? "Signing out…" : "Sign out"}
          </button>
        </div>
      )}
    </div>
  );
}
