import { useId, type ComponentProps, type ReactNode } from "react";
import { cn } from "@/lib/cn";
import { FieldError, Hint } from "./field";

const boxStyles =
  "mt-0.5 size-5 shrink-0 cursor-pointer accent-ember-600 rounded-sm border-ink-400 " +
  "disabled:cursor-not-allowed";

export interface CheckboxProps extends Omit<ComponentProps<"input">, "type"> {
  label: ReactNode;
  description?: ReactNode;
  error?: string;
}

/** A checkbox whose whole row (≥ 44 px tall) is the click target. */
export function Checkbox({ label, description, error, className, id, ...props }: CheckboxProps) {
  const generated = useId();
  const controlId = id ?? `check-${generated}`;
  return (
    <div className={className}>
      <label
        htmlFor={controlId}
        className="flex min-h-touch cursor-pointer items-start gap-3 rounded-md py-2.5 has-disabled:cursor-not-allowed"
      >
        <input
          id={controlId}
          type="checkbox"
          aria-invalid={error ? true : undefined}
          aria-describedby={description ? `${controlId}-desc` : undefined}
          className={boxStyles}
          {...props}
        />
        <span className="space-y-0.5">
          <span className="block text-base font-medium text-ink-900">{label}</span>
          {description ? <Hint id={`${controlId}-desc`}>{description}</Hint> : null}
        </span>
      </label>
      <FieldError>{error}</FieldError>
    </div>
  );
}

export interface RadioGroupProps {
  legend: ReactNode;
  hint?: ReactNode;
  error?: string;
  className?: string;
  /** Lay the options out side by side from the `sm` breakpoint. */
  isInline?: boolean;
  children: ReactNode;
}

/** A fieldset of {@link Radio}s. */
export function RadioGroup({ legend, hint, error, className, isInline, children }: RadioGroupProps) {
  return (
    <fieldset className={cn("space-y-2", className)}>
      <legend className="text-base font-medium text-ink-900">{legend}</legend>
      {hint ? <Hint>{hint}</Hint> : null}
      <div className={cn("grid gap-2", isInline && "sm:grid-flow-col sm:auto-cols-fr")}>{children}</div>
      <FieldError>{error}</FieldError>
    </fieldset>
  );
}

export interface RadioProps extends Omit<ComponentProps<"input">, "type"> {
  label: ReactNode;
  description?: ReactNode;
}

/** A radio drawn as a bordered option card; the selected card gets a thicker ember border. */
export function Radio({ label, description, className, id, ...props }: RadioProps) {
  const generated = useId();
  const controlId = id ?? `radio-${generated}`;
  return (
    <label
      htmlFor={controlId}
      className={cn(
        "flex min-h-touch cursor-pointer items-start gap-3 rounded-md border border-ink-300 bg-white px-3.5 py-3",
        "hover:border-ink-500 has-checked:border-ember-600 has-checked:bg-ember-50 has-checked:ring-1 has-checked:ring-ember-600",
        "has-focus-visible:outline-3 has-focus-visible:outline-offset-2 has-focus-visible:outline-focus",
        className,
      )}
    >
      <input
        id={controlId}
        type="radio"
        className="mt-1 size-4.5 shrink-0 accent-ember-600 focus-visible:outline-none"
        aria-describedby={description ? `${controlId}-desc` : undefined}
        {...props}
      />
      <span className="space-y-0.5">
        <span className="block text-base font-medium text-ink-900">{label}</span>
        {description ? (
          <span id={`${controlId}-desc`} className="block text-sm text-ink-600">
            {description}
          </span>
        ) : null}
      </span>
    </label>
  );
}
