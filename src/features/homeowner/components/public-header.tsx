/** The homeowner page's own plain header: the company, not Eavesight. */
export function PublicHeader({ companyName, phone, logoSrc }: { companyName: string | null; phone?: string | null; logoSrc?: string | null }) {
  const initials = (companyName ?? "")
    .split(/\s+/)
    .filter(Boolean)
    .slice(0, 2)
    .map((w) => w[0]!.toUpperCase())
    .join("");
  return (
    <header className="border-b border-ink-200 bg-white">
      <div className="mx-auto flex max-w-3xl items-center justify-between gap-3 px-4 py-3 sm:px-6">
        <div className="flex min-w-0 items-center gap-3">
          {companyName && logoSrc ? (
            // The name is written beside it, so the logo itself is decorative.
            <img src={logoSrc} alt="" className="h-10 w-auto max-w-40 shrink-0 object-contain" />
          ) : companyName ? (
            <span aria-hidden="true" className="flex size-10 shrink-0 items-center justify-center rounded-md bg-ink-900 text-base font-semibold text-white">
              {initials}
            </span>
          ) : null}
          <p className="text-lg leading-tight font-semibold text-ink-900">{companyName ?? "Your proposal"}</p>
        </div>
        {phone ? (
          <a
            href={`tel:${phone.replace(/[^\d+]/g, "")}`}
            aria-label={`Call ${companyName ?? "the company"} at ${phone}`}
            className="inline-flex min-h-touch shrink-0 items-center rounded-md px-2 text-base font-semibold whitespace-nowrap text-ember-700 underline decoration-ember-300 underline-offset-4"
          >
            <span className="sm:hidden">Call</span>
            <span className="hidden sm:inline">Call {phone}</span>
          </a>
        ) : null}
      </div>
    </header>
  );
}
