import type { ComponentProps } from "react";
import { cn } from "@/lib/cn";
import { controlStyles, FieldError, Hint, Label, useFieldIds, type FieldShellProps } from "./field";
import { ChevronDownIcon } from "./icons";

export interface SelectOption {
  value: string;
  label: string;
  disabled?: boolean;
}

export interface SelectProps extends Omit<ComponentProps<"select">, "children">, FieldShellProps {
  options: readonly SelectOption[];
  /** A first, empty choice such as "Choose a role". */
  placeholder?: string;
  /**
   * Hide the visible label (it stays as the accessible name). Use only where a column header or
   * row already says what the select is for.
   */
  isLabelHidden?: boolean;
  selectClassName?: string;
  /** Put the hint under the select (e.g. to explain the chosen option) instead of above it. */
  hintPlacement?: "above" | "below";
}

/** A native select (best on phones), styled to match the text inputs. `label` is required for a11y. */
export function Select({
  label,
  hint,
  error,
  isOptional,
  className,
  selectClassName,
  options,
  placeholder,
  isLabelHidden = false,
  hintPlacement = "above",
  id,
  ...props
}: SelectProps) {
  const { controlId, hintId, errorId } = useFieldIds(id);
  const describedBy = [hint ? hintId : null, error ? errorId : null].filter(Boolean).join(" ") || undefined;
  return (
    <div className={cn("space-y-1.5", className)}>
      <Label htmlFor={controlId} isOptional={isOptional} className={isLabelHidden ? "sr-only" : undefined}>
        {label}
      </Label>
      {hint && hintPlacement === "above" ? <Hint id={hintId}>{hint}</Hint> : null}
      <div className="relative">
        <select
          id={controlId}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy}
          className={cn(controlStyles, "h-touch appearance-none pr-10", selectClassName)}
          {...props}
        >
          {placeholder !== undefined ? <option value="">{placeholder}</option> : null}
          {options.map((option) => (
            <option key={option.value} value={option.value} disabled={option.disabled}>
              {option.label}
            </option>
          ))}
        </select>
        <ChevronDownIcon className="pointer-events-none absolute top-1/2 right-3 -translate-y-1/2 text-ink-600" />
      </div>
      {hint && hintPlacement === "below" ? <Hint id={hintId}>{hint}</Hint> : null}
      <FieldError id={errorId}>{error}</FieldError>
    </div>
  );
}
