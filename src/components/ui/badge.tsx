import type { ComponentProps, ReactNode } from "react";
import { cn } from "@/lib/cn";
import { CriticalIcon, InfoIcon, OkIcon, WarningIcon } from "./icons";

export type Severity = "critical" | "warning" | "info" | "ok";

const severityStyles: Record<Severity, string> = {
  critical: "bg-critical-50 text-critical-800 ring-critical-200",
  warning: "bg-warning-50 text-warning-800 ring-warning-200",
  info: "bg-info-50 text-info-800 ring-info-200",
  ok: "bg-ok-50 text-ok-800 ring-ok-200",
};

const severityIconStyles: Record<Severity, string> = {
  critical: "text-critical-600",
  warning: "text-warning-600",
  info: "text-info-600",
  ok: "text-ok-600",
};

export const SEVERITY_LABELS: Record<Severity, string> = {
  critical: "Critical",
  warning: "Warning",
  info: "Note",
  ok: "OK",
};

export function SeverityIcon({ severity, className }: { severity: Severity; className?: string }) {
  const Icon = { critical: CriticalIcon, warning: WarningIcon, info: InfoIcon, ok: OkIcon }[severity];
  return <Icon className={cn(severityIconStyles[severity], className)} />;
}

export interface SeverityBadgeProps extends Omit<ComponentProps<"span">, "children"> {
  severity: Severity;
  /** The word shown beside the icon; defaults to "Critical", "Warning", "Note" or "OK". */
  children?: ReactNode;
}

/** Status as icon + word, never colour alone. */
export function SeverityBadge({ severity, children, className, ...props }: SeverityBadgeProps) {
  return (
    <span
      className={cn(
        "inline-flex items-center gap-1.5 rounded-full px-2.5 py-0.5 text-sm font-semibold ring-1 ring-inset",
        severityStyles[severity],
        className,
      )}
      {...props}
    >
      <SeverityIcon severity={severity} className="size-4" />
      {children ?? SEVERITY_LABELS[severity]}
    </span>
  );
}

export type BadgeTone = "neutral" | "brand" | "outline";

const toneStyles: Record<BadgeTone, string> = {
  neutral: "bg-ink-100 text-ink-800 ring-ink-200",
  brand: "bg-ember-50 text-ember-800 ring-ember-200",
  outline: "bg-white text-ink-700 ring-ink-300",
};

/** A plain label chip (roles, counts, tags). For states use {@link SeverityBadge}. */
export function Badge({ tone = "neutral", className, ...props }: ComponentProps<"span"> & { tone?: BadgeTone }) {
  return (
    <span
      className={cn(
        "inline-flex items-center gap-1 rounded-full px-2.5 py-0.5 text-sm font-medium ring-1 ring-inset",
        toneStyles[tone],
        className,
      )}
      {...props}
    />
  );
}
