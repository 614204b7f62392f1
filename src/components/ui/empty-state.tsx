import type { ReactNode } from "react";
import { cn } from "@/lib/cn";

export interface EmptyStateProps {
  /** A decorative icon from ./icons, e.g. `<ClipboardIcon />`. */
  icon?: ReactNode;
  title: ReactNode;
  description?: ReactNode;
  /** Buttons or links for the next step. */
  action?: ReactNode;
  className?: string;
  /** Heading level of the title (defaults to h2). */
  headingLevel?: "h2" | "h3";
}

/** What a list or page shows when there is nothing in it yet, and what to do about it. */
export function EmptyState({ icon, title, description, action, className, headingLevel = "h2" }: EmptyStateProps) {
  const Heading = headingLevel;
  return (
    <div
      className={cn(
        "flex flex-col items-center rounded-lg border border-dashed border-ink-300 bg-ink-25 px-6 py-12 text-center sm:py-16",
        className,
      )}
    >
      {icon ? (
        <div className="mb-4 flex size-14 items-center justify-center rounded-full bg-white text-ember-700 ring-1 ring-ink-200 [&_svg]:size-7">
          {icon}
        </div>
      ) : null}
      <Heading className="text-lg font-semibold text-ink-900">{title}</Heading>
      {description ? <div className="mt-2 max-w-reading text-base text-ink-700">{description}</div> : null}
      {action ? <div className="mt-6 flex flex-col gap-3 sm:flex-row">{action}</div> : null}
    </div>
  );
}
