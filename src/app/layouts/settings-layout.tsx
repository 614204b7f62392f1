import { NavLink, Outlet } from "react-router";
import { cn } from "@/lib/cn";
import { useSession } from "@/lib/session";
import { navFor, SETTINGS_NAV } from "./nav-items";

/** Settings sections the role may use: a side list on desktop, a scrolling tab row on phones. */
export function SettingsLayout() {
  const { user } = useSession();
  const items = navFor(SETTINGS_NAV, user.role);
  return (
    <div className="lg:grid lg:grid-cols-[13rem_minmax(0,1fr)] lg:gap-10">
      <nav aria-label="Settings" className="-mx-4 mb-6 border-b border-ink-200 sm:-mx-6 lg:mx-0 lg:mb-0 lg:border-b-0">
        <p className="mb-3 hidden text-sm font-semibold tracking-wide text-ink-600 uppercase lg:block">Settings</p>
        <ul className="flex gap-1 overflow-x-auto px-4 sm:px-6 lg:flex-col lg:overflow-visible lg:px-0">
          {items.map(({ label, to, icon: Icon }) => (
            <li key={to} className="shrink-0">
              <NavLink
                to={to}
                className={({ isActive }) =>
                  cn(
                    "flex h-touch items-center gap-2.5 px-3 text-base font-medium whitespace-nowrap text-ink-700 hover:text-ink-900",
                    "border-b-3 border-transparent lg:rounded-md lg:border-b-0 lg:hover:bg-ink-100",
                    isActive && "border-ember-600 text-ink-900 lg:bg-white lg:shadow-card lg:ring-1 lg:ring-ink-200",
                  )
                }
              >
                <Icon className="hidden text-ink-600 lg:block" />
                {label}
              </NavLink>
            </li>
          ))}
        </ul>
      </nav>
      <div className="min-w-0">
        <Outlet />
      </div>
    </div>
  );
}
