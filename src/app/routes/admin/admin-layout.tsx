import { NavLink, Outlet } from "react-router-dom";
import { PageHeader } from "../../../components/ui/page-header";
import { cn } from "../../../lib/cn";

const TABS = [
  { to: "/admin/users", label: "Users" },
  { to: "/admin/groups", label: "Groups" },
  { to: "/admin/outbox", label: "Outbox" },
  { to: "/admin/queue", label: "Queue" },
];

/** Site administration: a heading, tabs, and the chosen panel. */
export function AdminLayout() {
  return (
    <>
      <PageHeader eyebrow="Admin" title="Site administration" description="Accounts and their site roles, all groups, the e-mail the site has sent, and the compute queue." />
      <nav aria-label="Administration" className="mb-6 flex gap-1 border-b border-line">
        {TABS.map((tab) => (
          <NavLink
            key={tab.to}
            to={tab.to}
            className={({ isActive }) =>
              cn(
                "-mb-px border-b-2 px-3 pb-2.5 text-sm font-medium transition-colors",
                isActive ? "border-ember-400 text-ink" : "border-transparent text-ink-soft hover:text-ink",
              )
            }
          >
            {tab.label}
          </NavLink>
        ))}
      </nav>
      <Outlet />
    </>
  );
}
