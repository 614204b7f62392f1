import { cn } from "@/lib/cn";

export interface SpinnerProps {
  className?: string;
  /** Spoken to screen readers; omit when a nearby text already says what is loading. */
  label?: string;
}

/** An indeterminate spinner. Inherits the text colour. */
export function Spinner({ className, label }: SpinnerProps) {
  return (
    <span role={label ? "status" : undefined} className="inline-flex items-center">
      <svg
        viewBox="0 0 24 24"
        className={cn("size-5 animate-spin motion-reduce:animate-[spin_1.5s_linear_infinite]", className)}
        aria-hidden="true"
        focusable="false"
      >
        <circle cx="12" cy="12" r="9" fill="none" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
        <path d="M21 12a9 9 0 0 0-9-9" fill="none" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      {label ? <span className="sr-only">{label}</span> : null}
    </span>
  );
}

/** Centred spinner with a visible caption, for a page or panel that is loading. */
export function LoadingBlock({ label = "Loading…", className }: { label?: string; className?: string }) {
  return (
    <div role="status" className={cn("flex items-center justify-center gap-3 py-16 text-ink-600", className)}>
      <Spinner className="size-6" />
      <span className="text-base">{label}</span>
    </div>
  );
}

export interface ProgressProps {
  /** 0 to `max`. Omit for an indeterminate bar. */
  value?: number;
  max?: number;
  /** Visible label above the bar (also its accessible name). */
  label: string;
  /** Visible value text, e.g. "3 of 5 sections". Defaults to a percentage. */
  valueText?: string;
  className?: string;
}

/** A labelled progress bar (role="progressbar"). */
export function Progress({ value, max = 100, label, valueText, className }: ProgressProps) {
  const isDeterminate = typeof value === "number";
  const clamped = isDeterminate ? Math.min(Math.max(value, 0), max) : 0;
  const percent = isDeterminate && max > 0 ? Math.round((clamped / max) * 100) : 0;
  const text = valueText ?? (isDeterminate ? `${percent}%` : undefined);
  return (
    <div className={cn("w-full", className)}>
      <div className="mb-1.5 flex items-baseline justify-between gap-4 text-sm">
        <span className="font-medium text-ink-800">{label}</span>
        {text ? <span className="tabular-nums text-ink-600">{text}</span> : null}
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={isDeterminate ? 0 : undefined}
        aria-valuemax={isDeterminate ? max : undefined}
        aria-valuenow={isDeterminate ? clamped : undefined}
        aria-valuetext={text}
        className="h-2.5 w-full overflow-hidden rounded-full bg-ink-100 ring-1 ring-inset ring-ink-200"
      >
        <div
          className={cn(
            "h-full rounded-full bg-ember-600 transition-[width] duration-300",
            !isDeterminate && "w-1/3 animate-pulse",
          )}
          style={isDeterminate ? { width: `${percent}%` } : undefined}
        />
      </div>
    </div>
  );
}
