import { cn } from "@/lib/cn";

/**
 * The Eavesight mark: a roof line over an airflow arrow that enters at the eave.
 * Same drawing as public/favicon.svg.
 */
export function BrandMark({ className, title }: { className?: string; title?: string }) {
  return (
    <svg
      viewBox="0 0 32 32"
      className={cn("size-8 shrink-0", className)}
      role={title ? "img" : undefined}
      aria-hidden={title ? undefined : true}
      focusable="false"
    >
      {title ? <title>{title}</title> : null}
      <rect width="32" height="32" rx="7" fill="#171C24" />
      <path d="M5 18.5 16 8.5l11 10" stroke="#DD6020" strokeWidth="3" fill="none" strokeLinecap="round" strokeLinejoin="round" />
      <path d="M8.5 24.5h11.5" stroke="#F4F6F8" strokeWidth="2.4" strokeLinecap="round" />
      <path d="m17.5 21.2 3.3 3.3-3.3 3.3" stroke="#F4F6F8" strokeWidth="2.4" fill="none" strokeLinecap="round" strokeLinejoin="round" />
    </svg>
  );
}

/** Mark plus the product name, for headers and the sign-in card. */
export function BrandLockup({ className, inverted = false }: { className?: string; inverted?: boolean }) {
  return (
    <span className={cn("inline-flex items-center gap-2.5", className)}>
      <BrandMark className={inverted ? "rounded-[7px] ring-1 ring-ink-600" : undefined} />
      <span className={cn("text-lg font-semibold tracking-tight", inverted ? "text-white" : "text-ink-900")}>
        Eavesight
      </span>
    </span>
  );
}
