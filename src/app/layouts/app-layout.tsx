import { useQuery } from "@tanstack/react-query";
import { useEffect } from "react";
import { Link, NavLink, Outlet, useLocation, useNavigate, useNavigation } from "react-router";
import { BrandMark } from "@/components/ui/brand-mark";
import { GearIcon } from "@/components/ui/icons";
import { LoadingBlock } from "@/components/ui/spinner";
import { paths } from "@/config/paths";
import { authQueries } from "@/features/auth/api/queries";
import { cn } from "@/lib/cn";
import { SessionProvider, type Session } from "@/lib/session";
import { AccountMenu } from "./account-menu";
import { FieldStatus } from "./field-status";
import { UpdatePrompt } from "./update-prompt";
import { MAIN_NAV, navFor } from "./nav-items";

function NavigationProgress() {
  const navigation = useNavigation();
  const isLoading = navigation.state !== "idle";
  return (
    <div
      aria-hidden="true"
      className={cn(
        "pointer-events-none fixed inset-x-0 top-0 z-50 h-1 origin-left bg-ember-500 transition-transform duration-500",
        isLoading ? "scale-x-75" : "scale-x-0 duration-150",
      )}
    />
  );
}

function SkipLink() {
  return (
    <a
      href="#main"
      className="sr-only z-50 rounded-md bg-white px-4 py-3 font-semibold text-ink-900 focus:not-sr-only focus:fixed focus:top-2 focus:left-2"
    >
      Skip to content
    </a>
  );
}

function DesktopNav({ session }: { session: Session }) {
  const items = navFor(MAIN_NAV, session.user.role);
  return (
    <nav aria-label="Main" className="hidden md:block">
      <ul className="flex items-center gap-1">
        {[...items, { label: "Settings", to: paths.app.settings.root.getHref(), area: "profile" as const, icon: GearIcon }].map(
          (item) => (
            <li key={item.to}>
              <NavLink
                to={item.to}
                className={({ isActive }) =>
                  cn(
                    "flex h-touch items-center rounded-md px-3.5 text-base font-medium text-ink-200 hover:bg-ink-800 hover:text-white",
                    isActive && "bg-ink-800 text-white shadow-[inset_0_-3px_0_#DD6020]",
                  )
                }
              >
                {item.label}
              </NavLink>
            </li>
          ),
        )}
      </ul>
    </nav>
  );
}

/** Phone navigation: a bottom bar within thumb reach, icon + word on every tab. */
function BottomNav({ session }: { session: Session }) {
  const items = [
    ...navFor(MAIN_NAV, session.user.role),
    { label: "Settings", to: paths.app.settings.root.getHref(), area: "profile" as const, icon: GearIcon },
  ];
  return (
    <nav
      aria-label="Main"
      className="fixed inset-x-0 bottom-0 z-20 border-t border-ink-700 bg-ink-900 pb-[env(safe-area-inset-bottom)] md:hidden"
    >
      <ul className="grid h-bar" style={{ gridTemplateColumns: `repeat(${items.length}, minmax(0, 1fr))` }}>
        {items.map(({ label, to, icon: Icon }) => (
          <li key={to} className="flex">
            <NavLink
              to={to}
              className={({ isActive }) =>
                cn(
                  "relative flex flex-1 flex-col items-center justify-center gap-1 text-xs font-medium text-ink-300 focus-visible:-outline-offset-4",
                  isActive && "text-white before:absolute before:inset-x-3 before:top-0 before:h-[3px] before:rounded-b before:bg-ember-500",
                )
              }
            >
              <Icon className="size-6" />
              <span className="max-w-full truncate px-0.5">{label}</span>
            </NavLink>
          </li>
        ))}
      </ul>
    </nav>
  );
}

/** The signed-in shell: header with mark, navigation, person and company; page content below. */
export function AppLayout() {
  const { data: session } = useQuery(authQueries.me());
  const location = useLocation();
  const navigate = useNavigate();

  // The session ended while the app was open (expired, signed out elsewhere, deactivated).
  useEffect(() => {
    if (session === null) {
      void navigate(paths.auth.signIn.getHref(`${location.pathname}${location.search}`, "session-ended"), {
        replace: true,
      });
    }
  }, [session, location.pathname, location.search, navigate]);

  if (!session) return <LoadingBlock className="min-h-dvh" label="Checking your sign-in…" />;

  return (
    <SessionProvider session={session}>
      <SkipLink />
      <NavigationProgress />
      <div className="flex min-h-dvh flex-col">
        <header className="sticky top-0 z-20 bg-ink-900 text-white shadow-[0_1px_0_rgb(255_255_255/0.06)]">
          <div className="mx-auto flex h-14 max-w-content items-center gap-3 px-3 sm:px-6 md:h-16 md:gap-6 lg:px-8">
            <Link
              to={paths.app.projects.getHref()}
              className="flex min-h-touch min-w-0 items-center gap-2.5 rounded-md pr-2"
              aria-label="Eavesight, go to projects"
            >
              <BrandMark className="size-8 ring-1 ring-ink-700 rounded-[7px]" />
              <span className="flex min-w-0 flex-col leading-tight">
                <span className="text-lg font-semibold tracking-tight">Eavesight</span>
                <span className="truncate text-xs text-ink-300 md:hidden">{session.company.name}</span>
              </span>
            </Link>
            <DesktopNav session={session} />
            <div className="ml-auto flex items-center gap-2">
              <FieldStatus />
              <AccountMenu />
            </div>
          </div>
        </header>
        <main id="main" tabIndex={-1} className="flex-1 focus:outline-none">
          <div className="mx-auto w-full max-w-content px-4 pt-6 pb-[calc(6.25rem+env(safe-area-inset-bottom))] sm:px-6 md:pt-10 md:pb-16 lg:px-8">
            <Outlet />
          </div>
        </main>
      </div>
      <BottomNav session={session} />
      <UpdatePrompt />
    </SessionProvider>
  );
}
