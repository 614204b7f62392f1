import type { ReactNode } from "react";
import { cn } from "@/lib/cn";

export interface PageHeaderProps {
  title: ReactNode;
  description?: ReactNode;
  /** Small line above the title, e.g. a breadcrumb or back link. */
  eyebrow?: ReactNode;
  /** Primary page actions; they wrap under the title on phones. */
  actions?: ReactNode;
  className?: string;
  /** Browser tab title; defaults to `title` when it is plain text. "· Eavesight" is appended. */
  documentTitle?: string;
}

/** The page's one h1, its purpose in a sentence, and its main actions. */
export function PageHeader({ title, description, eyebrow, actions, className, documentTitle }: PageHeaderProps) {
  const tabTitle = documentTitle ?? (typeof title === "string" ? title : undefined);
  return (
    <header className={cn("mb-6 flex flex-col gap-4 sm:mb-8 md:flex-row md:items-end md:justify-between", className)}>
      {tabTitle ? <title>{`${tabTitle} · Eavesight`}</title> : null}
      <div className="min-w-0 space-y-1.5">
        {eyebrow ? <div className="text-sm font-medium text-ink-600">{eyebrow}</div> : null}
        <h1 className="text-2xl font-semibold tracking-tight text-ink-900 sm:text-3xl">{title}</h1>
        {description ? <p className="max-w-reading text-base text-ink-700">{description}</p> : null}
      </div>
      {actions ? <div className="flex flex-wrap gap-3 md:shrink-0">{actions}</div> : null}
    </header>
  );
}
