import type { ComponentProps } from "react";
import { cn } from "@/lib/cn";

/**
 * Table styles. On phones a table becomes a stack of cards: give each `Td` a `label` (the column
 * name) and it is shown above the value below the `md` breakpoint. On phones each cell spans the
 * card's width; `isHalfOnPhone` puts two short cells (a status, a date) side by side. Works with @tanstack/react-table
 * (render its header groups and rows into these).
 */
export function TableContainer({ className, ...props }: ComponentProps<"div">) {
  return <div className={cn("md:overflow-x-auto md:rounded-lg md:border md:border-ink-200 md:bg-white md:shadow-card", className)} {...props} />;
}

export function Table({ className, ...props }: ComponentProps<"table">) {
  return <table className={cn("w-full border-collapse text-left text-base", className)} {...props} />;
}

export function THead({ className, ...props }: ComponentProps<"thead">) {
  return <thead className={cn("max-md:sr-only md:border-b md:border-ink-200 md:bg-ink-50", className)} {...props} />;
}

export function TBody({ className, ...props }: ComponentProps<"tbody">) {
  return <tbody className={cn("max-md:flex max-md:flex-col max-md:gap-3 md:divide-y md:divide-ink-100", className)} {...props} />;
}

export function Tr({ className, ...props }: ComponentProps<"tr">) {
  return (
    <tr
      className={cn(
        "max-md:grid max-md:grid-cols-2 max-md:gap-x-4 max-md:gap-y-3 max-md:rounded-lg max-md:border max-md:border-ink-200 max-md:bg-white max-md:p-4 max-md:shadow-card",
        "md:hover:bg-ink-25",
        className,
      )}
      {...props}
    />
  );
}

export function Th({ className, scope = "col", ...props }: ComponentProps<"th">) {
  return (
    <th
      scope={scope}
      className={cn("px-4 py-3 text-sm font-semibold whitespace-nowrap text-ink-700", className)}
      {...props}
    />
  );
}

export interface TdProps extends ComponentProps<"td"> {
  /** Column name, shown above the value on phones. */
  label?: string;
  /** On phones, take half the card's width instead of all of it. */
  isHalfOnPhone?: boolean;
}

export function Td({ className, label, isHalfOnPhone = false, children, ...props }: TdProps) {
  return (
    <td
      className={cn("align-middle text-ink-900 max-md:empty:hidden md:px-4 md:py-3", isHalfOnPhone ? "max-md:col-span-1" : "max-md:col-span-2", className)}
      {...props}
    >
      {label ? <span className="mb-0.5 block text-sm font-medium text-ink-600 md:hidden">{label}</span> : null}
      {children}
    </td>
  );
}
