import { useId, useRef, type KeyboardEvent, type ReactNode } from "react";
import { cn } from "@/lib/cn";

export interface TabItem<V extends string> {
  value: V;
  label: ReactNode;
  /** Extra words after the label (a count, a state), part of the tab's name. */
  badge?: ReactNode;
}

export interface TabsProps<V extends string> {
  /** What the tabs choose between, for screen readers ("Attic spaces"). */
  label: string;
  items: readonly TabItem<V>[];
  value: V;
  onChange: (value: V) => void;
  className?: string;
  /** Stretch the tabs to fill the row (a phone's two-way switch). */
  isFullWidth?: boolean;
  /** Id prefix that the panel uses: `tabPanelId(idBase, value)`. */
  idBase?: string;
}

export const tabId = (idBase: string, value: string) => `${idBase}-tab-${value}`;
export const tabPanelId = (idBase: string, value: string) => `${idBase}-panel-${value}`;

/**
 * A row of tabs (WAI-ARIA tabs pattern): arrow keys move between tabs, Home/End jump, each tab
 * is at least 44 px tall, and the selected one is marked by a thick underline and bold text, not
 * colour alone. Scrolls sideways when the tabs don't fit a phone.
 */
export function Tabs<V extends string>({ label, items, value, onChange, className, isFullWidth, idBase }: TabsProps<V>) {
  const generated = useId();
  const base = idBase ?? generated;
  const listRef = useRef<HTMLDivElement>(null);

  function focusTab(index: number) {
    const item = items[(index + items.length) % items.length];
    if (!item) return;
    onChange(item.value);
    listRef.current?.querySelector<HTMLButtonElement>(`#${CSS.escape(tabId(base, item.value))}`)?.focus();
  }

  function onKeyDown(event: KeyboardEvent<HTMLButtonElement>, index: number) {
    if (event.key === "ArrowRight") focusTab(index + 1);
    else if (event.key === "ArrowLeft") focusTab(index - 1);
    else if (event.key === "Home") focusTab(0);
    else if (event.key === "End") focusTab(items.length - 1);
    else return;
    event.preventDefault();
  }

  return (
    <div
      ref={listRef}
      role="tablist"
      aria-label={label}
      className={cn("flex gap-1 overflow-x-auto border-b border-ink-200", className)}
    >
      {items.map((item, index) => {
        const isSelected = item.value === value;
        return (
          <button
            key={item.value}
            id={tabId(base, item.value)}
            type="button"
            role="tab"
            aria-selected={isSelected}
            aria-controls={tabPanelId(base, item.value)}
            tabIndex={isSelected ? 0 : -1}
            onClick={() => onChange(item.value)}
            onKeyDown={(event) => onKeyDown(event, index)}
            className={cn(
              "relative -mb-px flex min-h-touch shrink-0 items-center justify-center gap-2 border-b-[3px] px-3.5 text-base whitespace-nowrap",
              "focus-visible:-outline-offset-2",
              isFullWidth && "flex-1",
              isSelected
                ? "border-ember-600 font-semibold text-ink-900"
                : "border-transparent font-medium text-ink-600 hover:border-ink-300 hover:text-ink-900",
            )}
          >
            {item.label}
            {item.badge ? <span className="text-sm font-normal text-ink-600">{item.badge}</span> : null}
          </button>
        );
      })}
    </div>
  );
}
