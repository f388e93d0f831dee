import { NavLink, Outlet } from "react-router";
import { useMe } from "@/api/auth";
import { cx } from "@/components/ui/cx";
import { adminPaths, teachPaths } from "@/features/teach/paths";

const LINKS = [
  { to: adminPaths.overview, label: "Overview", end: true },
  { to: adminPaths.users, label: "Users", end: false },
  { to: teachPaths.dashboard, label: "Cohorts", end: false },
  { to: adminPaths.audit, label: "Audit log", end: false },
  { to: adminPaths.outbox, label: "Outbox", end: false },
];

/** The admin area's second row of navigation, on the forge band; scrolls sideways on a phone. */
export function AdminSection() {
  const me = useMe();
  return (
    <>
      {me.data?.role === "admin" ? (
        <nav aria-label="School admin" className="border-b border-soot-700 bg-soot-900">
          <ul className="mx-auto flex max-w-page gap-1 relative overflow-x-auto px-gutter">
            {LINKS.map((link) => (
              <li key={link.to} className="shrink-0">
                <NavLink
                  to={link.to}
                  end={link.end}
                  className={({ isActive }) =>
                    cx(
                      "inline-flex min-h-11 items-center border-b-2 px-3 text-sm font-medium transition-colors",
                      isActive ? "border-ember-400 text-ember-200" : "border-transparent text-ash-200 hover:text-bone-50",
                    )
                  }
                >
                  {link.label}
                </NavLink>
              </li>
            ))}
          </ul>
        </nav>
      ) : null}
      <Outlet />
    </>
  );
}
