import { Outlet } from "react-router";
import { BrandLockup } from "@/components/ui/brand-mark";

/** A cross-section of an attic with air entering at the soffits and leaving at the ridge. */
function AtticAirflowArt() {
  return (
    <svg viewBox="0 0 360 200" className="w-full max-w-md" aria-hidden="true" focusable="false">
      <path d="M20 150 180 40l160 110" fill="none" stroke="#DD6020" strokeWidth="6" strokeLinecap="round" strokeLinejoin="round" />
      <path d="M50 150h260" stroke="#4A5462" strokeWidth="4" strokeLinecap="round" />
      <path d="M60 172h240" stroke="#363F4B" strokeWidth="3" strokeDasharray="2 10" strokeLinecap="round" />
      <g fill="none" stroke="#F4F6F8" strokeWidth="3.5" strokeLinecap="round" strokeLinejoin="round">
        <path d="M36 166c24-4 44-18 70-40s40-40 64-62" />
        <path d="m158 58 12 6-1-13" />
        <path d="M324 166c-24-4-44-18-70-40s-40-40-64-62" />
        <path d="m202 58-12 6 1-13" />
        <path d="M180 46V14" />
        <path d="m170 24 10-10 10 10" />
      </g>
      <g fill="#AAB3BF" fontFamily="IBM Plex Sans, sans-serif" fontSize="13" fontWeight="500">
        <text x="22" y="194">Intake at the soffits</text>
        <text x="214" y="20">Exhaust at the ridge</text>
      </g>
    </svg>
  );
}

/** Signed-out pages: one centred card; on wide screens a quiet panel says what Eavesight is for. */
export function AuthLayout() {
  return (
    <div className="grid min-h-dvh bg-white lg:grid-cols-[minmax(0,5fr)_minmax(0,6fr)]">
      <aside className="hidden flex-col justify-between bg-ink-900 p-12 text-white lg:flex">
        <BrandLockup inverted />
        <div className="space-y-8">
          <AtticAirflowArt />
          <div className="max-w-md space-y-3">
            <p className="text-3xl font-semibold tracking-tight">From the attic hatch to a signed proposal.</p>
            <p className="text-lg text-ink-300">
              Survey the attic, check the vent math against code, price the fix and send it, all in one place.
            </p>
          </div>
        </div>
        <p className="text-sm text-ink-400">For roofing and attic ventilation contractors.</p>
      </aside>
      <main className="flex flex-col items-center px-5 py-8 sm:justify-center sm:bg-ink-50 sm:px-8 sm:py-12">
        <div className="w-full max-w-form">
          <div className="mb-8 lg:hidden">
            <BrandLockup />
          </div>
          <div className="sm:rounded-xl sm:border sm:border-ink-200 sm:bg-white sm:p-8 sm:shadow-card">
            <Outlet />
          </div>
        </div>
      </main>
    </div>
  );
}
