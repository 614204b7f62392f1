import { Outlet, ScrollRestoration } from "react-router";
import { BrandMark } from "@/components/ui/brand-mark";
import { Spinner } from "@/components/ui/spinner";

export function RootLayout() {
  return (
    <>
      <Outlet />
      <ScrollRestoration />
    </>
  );
}

/** Shown while the first route's code and data load. */
export function FullPageLoading() {
  return (
    <div role="status" className="flex min-h-dvh flex-col items-center justify-center gap-4 text-ink-600">
      <BrandMark className="size-12" />
      <span className="flex items-center gap-2 text-base">
        <Spinner />
        Loading Eavesight…
      </span>
    </div>
  );
}
