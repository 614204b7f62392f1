import type { ReactNode } from "react";
import { cn } from "@/lib/cn";
import { SeverityIcon, type Severity } from "./badge";

const styles: Record<Severity, string> = {
  critical: "border-critical-200 bg-critical-50 text-critical-900",
  warning: "border-warning-200 bg-warning-50 text-warning-900",
  info: "border-info-200 bg-info-50 text-info-900",
  ok: "border-ok-200 bg-ok-50 text-ok-900",
};

export interface AlertProps {
  severity?: Severity;
  title?: ReactNode;
  children?: ReactNode;
  className?: string;
  /** Announce immediately (role="alert"); use for errors that appear after an action. Default: critical only. */
  isAssertive?: boolean;
}

/** A boxed message with an icon: form-level errors, confirmations, notices. */
export function Alert({ severity = "info", title, children, className, isAssertive }: AlertProps) {
  const assertive = isAssertive ?? severity === "critical";
  return (
    <div
      role={assertive ? "alert" : "status"}
      className={cn("flex gap-3 rounded-md border px-4 py-3 text-base", styles[severity], className)}
    >
      <SeverityIcon severity={severity} className="mt-0.5" />
      <div className="min-w-0 space-y-1">
        {title ? <p className="font-semibold">{title}</p> : null}
        {children ? <div className="text-base">{children}</div> : null}
      </div>
    </div>
  );
}
