import { useId, useState, type ComponentProps, type ReactNode } from "react";
import { cn } from "@/lib/cn";
import { CriticalIcon, EyeIcon, EyeOffIcon } from "./icons";

export function Label({ className, children, isOptional, ...props }: ComponentProps<"label"> & { isOptional?: boolean }) {
  return (
    <label className={cn("block text-base font-medium text-ink-900", className)} {...props}>
      {children}
      {isOptional ? <span className="ml-1.5 font-normal text-ink-600">(optional)</span> : null}
    </label>
  );
}

export function Hint({ className, ...props }: ComponentProps<"p">) {
  return <p className={cn("text-sm text-ink-600", className)} {...props} />;
}

/** A field's error message, with an icon so it never relies on red alone. Renders nothing without children. */
export function FieldError({ className, children, ...props }: ComponentProps<"p">) {
  if (!children) return null;
  return (
    <p className={cn("flex items-start gap-1.5 text-sm font-medium text-critical-700", className)} {...props}>
      <CriticalIcon className="mt-0.5 size-4" />
      <span>{children}</span>
    </p>
  );
}

export const controlStyles =
  "block w-full rounded-md border border-ink-400 bg-white px-3.5 text-base text-ink-900 " +
  "placeholder:text-ink-500 hover:border-ink-500 " +
  "focus-visible:border-focus focus-visible:outline-2 focus-visible:outline-offset-0 focus-visible:outline-focus " +
  "disabled:cursor-not-allowed disabled:bg-ink-50 disabled:text-ink-600 read-only:bg-ink-50 " +
  "aria-invalid:border-critical-600 aria-invalid:hover:border-critical-700";

/** Wires ids between a control, its hint and its error. */
export function useFieldIds(id?: string) {
  const generated = useId();
  const controlId = id ?? `field-${generated}`;
  return { controlId, hintId: `${controlId}-hint`, errorId: `${controlId}-error` };
}

/** The aria-describedby value for the ids that apply, or none. */
export function describedBy(...ids: (string | false | null | undefined)[]): string | undefined {
  const joined = ids.filter(Boolean).join(" ");
  return joined === "" ? undefined : joined;
}

export interface FieldShellProps {
  label: ReactNode;
  hint?: ReactNode;
  error?: string;
  isOptional?: boolean;
  className?: string;
}

export interface TextFieldProps extends Omit<ComponentProps<"input">, "size">, FieldShellProps {
  /** Content inside the right edge of the input (e.g. a unit, or a show-password button). */
  trailing?: ReactNode;
  inputClassName?: string;
}

/** Label + input + hint + error, all connected for screen readers. Pass `register("x")` straight in. */
export function TextField({
  label,
  hint,
  error,
  isOptional,
  className,
  inputClassName,
  trailing,
  id,
  ...props
}: TextFieldProps) {
  const { controlId, hintId, errorId } = useFieldIds(id);
  return (
    <div className={cn("space-y-1.5", className)}>
      <Label htmlFor={controlId} isOptional={isOptional}>
        {label}
      </Label>
      {hint ? <Hint id={hintId}>{hint}</Hint> : null}
      <div className="relative">
        <input
          id={controlId}
          aria-invalid={error ? true : undefined}
          aria-describedby={describedBy(hint ? hintId : undefined, error ? errorId : undefined)}
          className={cn(controlStyles, "h-touch", trailing ? "pr-14" : undefined, inputClassName)}
          {...props}
        />
        {trailing ? <div className="absolute inset-y-0 right-0 flex items-center">{trailing}</div> : null}
      </div>
      <FieldError id={errorId}>{error}</FieldError>
    </div>
  );
}

/** A password input with a show/hide button (typing on a phone in gloves is error-prone). */
export function PasswordField(props: Omit<TextFieldProps, "type" | "trailing">) {
  const [isVisible, setIsVisible] = useState(false);
  return (
    <TextField
      {...props}
      type={isVisible ? "text" : "password"}
      autoCapitalize="none"
      autoCorrect="off"
      spellCheck={false}
      trailing={
        <button
          type="button"
          onClick={() => setIsVisible((v) => !v)}
          aria-pressed={isVisible}
          aria-label={isVisible ? "Hide password" : "Show password"}
          className="mr-0.5 inline-flex size-touch items-center justify-center rounded-md text-ink-600 hover:text-ink-900"
        >
          {isVisible ? <EyeOffIcon /> : <EyeIcon />}
        </button>
      }
    />
  );
}

export interface TextAreaProps extends ComponentProps<"textarea">, FieldShellProps {}

export function TextArea({ label, hint, error, isOptional, className, id, rows = 4, ...props }: TextAreaProps) {
  const { controlId, hintId, errorId } = useFieldIds(id);
  return (
    <div className={cn("space-y-1.5", className)}>
      <Label htmlFor={controlId} isOptional={isOptional}>
        {label}
      </Label>
      {hint ? <Hint id={hintId}>{hint}</Hint> : null}
      <textarea
        id={controlId}
        rows={rows}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(hint ? hintId : undefined, error ? errorId : undefined)}
        className={cn(controlStyles, "py-2.5")}
        {...props}
      />
      <FieldError id={errorId}>{error}</FieldError>
    </div>
  );
}
