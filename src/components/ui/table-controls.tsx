import type { ReactNode } from "react";
import { cn } from "@/lib/cn";
import { Button } from "./button";
import { ChevronDownIcon, ChevronLeftIcon, ChevronRightIcon } from "./icons";

export type SortDirection = "asc" | "desc";

export interface SortHeaderProps {
  children: ReactNode;
  /** The direction this column is sorted in, or false when another column is. */
  sorted: SortDirection | false;
  onSort: () => void;
  className?: string;
}

/** A column header button that sorts; the arrow and the spoken name say the direction (not colour). */
export function SortHeader({ children, sorted, onSort, className }: SortHeaderProps) {
  const spoken = sorted === "asc" ? ", sorted A to Z / oldest first" : sorted === "desc" ? ", sorted Z to A / newest first" : "";
  return (
    <button
      type="button"
      onClick={onSort}
      className={cn(
        "-mx-2 inline-flex min-h-9 items-center gap-1 rounded-md px-2 text-sm font-semibold text-ink-700 hover:bg-ink-100 hover:text-ink-900",
        sorted && "text-ink-900",
        className,
      )}
    >
      {children}
      <span className="sr-only">{spoken}</span>
      <ChevronDownIcon
        className={cn("size-4 transition-transform", !sorted && "opacity-30", sorted === "asc" && "rotate-180")}
      />
    </button>
  );
}

export interface PaginationProps {
  page: number;
  pageSize: number;
  total: number;
  onPageChange: (page: number) => void;
  /** "projects", "customers": used in "Showing 1–25 of 5,000 projects". */
  noun: string;
  className?: string;
  isFetching?: boolean;
}

const count = new Intl.NumberFormat("en-US");

/** Previous / next with "Showing 26–50 of 5,000"; buttons are 44 px on touch screens. */
export function Pagination({ page, pageSize, total, onPageChange, noun, className, isFetching }: PaginationProps) {
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  const last = Math.min(total, page * pageSize);
  return (
    <nav
      aria-label={`Pages of ${noun}`}
      className={cn("flex flex-wrap items-center justify-between gap-3 py-3", className)}
    >
      <p className="text-sm text-ink-700" aria-live="polite">
        {total === 0 ? `No ${noun}` : `Showing ${count.format(first)}–${count.format(last)} of ${count.format(total)} ${noun}`}
        {isFetching ? <span className="ml-2 text-ink-500">· updating…</span> : null}
      </p>
      <div className="flex items-center gap-2">
        <Button
          variant="secondary"
          size="sm"
          icon={<ChevronLeftIcon />}
          disabled={page <= 1}
          onClick={() => onPageChange(page - 1)}
        >
          Previous
        </Button>
        <span className="px-1 text-sm whitespace-nowrap text-ink-700">
          Page {count.format(page)} of {count.format(pageCount)}
        </span>
        <Button variant="secondary" size="sm" disabled={page >= pageCount} onClick={() => onPageChange(page + 1)}>
          Next
          <ChevronRightIcon />
        </Button>
      </div>
    </nav>
  );
}
