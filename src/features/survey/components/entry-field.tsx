import { useEffect, type ReactNode } from "react";
import { controlStyles, describedBy, FieldError, Hint, Label, useFieldIds } from "@/components/ui/field";
import { OkIcon } from "@/components/ui/icons";
import { cn } from "@/lib/cn";
import { loadExpressionReader, type EntryDraft } from "../lib/measure";

export interface EntryFieldProps {
  label: ReactNode;
  entry: EntryDraft;
  /** Called with the typed text; the caller parses it into a new entry. */
  onText: (text: string) => void;
  hint?: ReactNode;
  placeholder?: string;
  /** "decimal" for plain numbers; measurement fields keep the full keyboard for ' and ". */
  inputMode?: "text" | "decimal" | "numeric";
  isOptional?: boolean;
  /** Short unit shown inside the right edge ("sq in/ft", "cfm"). */
  suffix?: string;
  className?: string;
  disabled?: boolean;
  /** Show what was understood under the field (measurement fields). */
  showUnderstood?: boolean;
}

/**
 * A typed entry with, under it, what Eavesight understood ("24 ft 6 in = 24.5 ft") or why it
 * can't read it. The text stays exactly as typed either way.
 */
export function EntryField({
  label,
  entry,
  onText,
  hint,
  placeholder,
  inputMode = "text",
  isOptional,
  suffix,
  className,
  disabled,
  showUnderstood = true,
}: EntryFieldProps) {
  const { controlId, hintId, errorId } = useFieldIds();
  const understoodId = `${controlId}-understood`;
  useReadAgainWhenReaderLoads(entry, onText);
  return (
    <div className={cn("space-y-1.5", className)}>
      <Label htmlFor={controlId} isOptional={isOptional}>
        {label}
      </Label>
      {hint ? <Hint id={hintId}>{hint}</Hint> : null}
      <div className="relative">
        <input
          id={controlId}
          type="text"
          inputMode={inputMode}
          autoComplete="off"
          autoCorrect="off"
          spellCheck={false}
          enterKeyHint="next"
          value={entry.text}
          placeholder={placeholder}
          disabled={disabled}
          aria-invalid={entry.error ? true : undefined}
          aria-describedby={describedBy(hint ? hintId : null, entry.error ? errorId : null, entry.understood && showUnderstood ? understoodId : null)}
          onChange={(event) => onText(event.target.value)}
          className={cn(controlStyles, "h-touch", suffix && "pr-20")}
        />
        {suffix ? (
          <span className="pointer-events-none absolute inset-y-0 right-3 flex items-center text-sm text-ink-600">{suffix}</span>
        ) : null}
      </div>
      <div aria-live="polite" className="min-h-0">
        {entry.error ? (
          <FieldError id={errorId}>{entry.error}</FieldError>
        ) : entry.understood && showUnderstood ? (
          <p id={understoodId} className="flex items-start gap-1.5 text-sm text-ink-700">
            <OkIcon className="mt-0.5 size-4 text-ok-600" />
            <span>
              <span className="sr-only">Understood: </span>
              {entry.understood}
            </span>
          </p>
        ) : null}
      </div>
    </div>
  );
}

/** An expression typed before the expression reader arrived is read again once it has loaded. */
function useReadAgainWhenReaderLoads(entry: EntryDraft, onText: (text: string) => void) {
  const { isPending, text } = entry;
  useEffect(() => {
    if (!isPending) return;
    let isCurrent = true;
    void loadExpressionReader().then(() => {
      if (isCurrent) onText(text);
    });
    return () => {
      isCurrent = false;
    };
  }, [isPending, text, onText]);
}
