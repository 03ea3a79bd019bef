import { Link, NavLink, useLocation } from "react-router-dom";
import type { User } from "../../../shared/schemas";
import { Wordmark } from "../../components/brand/logo-mark";
import { cn } from "../../lib/cn";
import { AccountMenu } from "./account-menu";

/** `section`: further paths that belong to the item (the Maps tab stays lit on /maps/…). */
type NavItem = { to: string; label: string; end?: boolean; section?: string };

function navItems(user: User): NavItem[] {
  const items: NavItem[] = [
    { to: "/", label: "Maps", end: true, section: "/maps/" },
    { to: "/probes", label: "Probe" },
    { to: "/groups", label: "Groups" },
  ];
  if (user.siteRole === "admin") items.push({ to: "/admin", label: "Admin" });
  return items;
}

/** Active tab: white label with a settled ball under it. */
function NavItems({ items, className }: { items: NavItem[]; className?: string }) {
  const { pathname } = useLocation();
  return (
    <nav aria-label="Main" className={className}>
      {items.map((item) => {
        const lit = (exact: boolean) => exact || (item.section !== undefined && pathname.startsWith(item.section));
        return (
          <NavLink
            key={item.to}
            to={item.to}
            end={item.end}
            className={({ isActive }) =>
              cn(
                "relative flex h-full items-center px-3 text-sm font-medium transition-colors",
                lit(isActive) ? "text-white" : "text-well-200 hover:text-white",
              )
            }
          >
            {({ isActive }) => (
              <>
                {item.label}
                {lit(isActive) && <span aria-hidden="true" className="absolute bottom-1.5 left-1/2 h-1.5 w-1.5 -translate-x-1/2 rounded-full bg-ember-400" />}
              </>
            )}
          </NavLink>
        );
      })}
    </nav>
  );
}

export function TopBar({ user }: { user: User }) {
  const items = navItems(user);
  return (
    <header className="sticky top-0 z-30 bg-well-900 shadow-[0_1px_0_rgb(255_255_255/0.06)]">
      <div className="mx-auto flex h-14 max-w-6xl items-center gap-6 px-4 sm:px-6">
        <Link to="/" aria-label="Equilibrist home" className="shrink-0">
          <Wordmark />
        </Link>
        <NavItems items={items} className="hidden h-full items-stretch sm:flex" />
        <div className="ml-auto">
          <AccountMenu user={user} />
        </div>
      </div>
      <NavItems items={items} className="flex h-10 items-stretch border-t border-well-800 px-2 sm:hidden" />
    </header>
  );
}
