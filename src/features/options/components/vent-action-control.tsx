import { useId } from "react";
import type { VentAction } from "@shared/schemas/options";
import { formatNumber } from "@shared/units/format";
import { VENT_KIND_LABELS, type Vent } from "@shared/ventilation/index";
import { cn } from "@/lib/cn";

const ACTIONS: { value: VentAction; label: string }[] = [
  { value: "keep", label: "Keep" },
  { value: "remove", label: "Remove" },
  { value: "replace", label: "Replace" },
];

/** A surveyed vent in words: "East gable fan: powered gable fan, 1,200 cfm, high". */
export function ventWords(vent: Vent): { name: string; detail: string } {
  const kind = VENT_KIND_LABELS[vent.kind];
  const size =
    vent.cfm !== undefined
      ? `${vent.quantity && vent.quantity > 1 ? `${vent.quantity} × ` : ""}${formatNumber(vent.cfm)} cfm`
      : vent.lengthFt !== undefined
        ? `${formatNumber(vent.lengthFt)} ft${vent.nfaSqInPerFt !== undefined ? ` at ${formatNumber(vent.nfaSqInPerFt)} sq in/ft` : ""}`
        : vent.quantity !== undefined
          ? `${vent.quantity} × ${vent.nfaSqInPerUnit !== undefined ? `${formatNumber(vent.nfaSqInPerUnit)} sq in` : "vent"}`
          : vent.grossWidthIn !== undefined
            ? `${formatNumber(vent.grossWidthIn)} × ${formatNumber(vent.grossHeightIn ?? 0)} in opening`
            : "";
  const where = vent.location === "upper" ? "high (exhaust)" : "low (intake)";
  return { name: vent.label ?? kind.charAt(0).toUpperCase() + kind.slice(1), detail: [vent.label ? kind : null, size, where].filter(Boolean).join(", ") };
}

export interface VentActionControlProps {
  vent: Vent;
  value: VentAction;
  onChange: (action: VentAction) => void;
  isDisabled?: boolean;
}

/**
 * Keep / Remove / Replace for one surveyed vent, as a labelled segmented control (radio group).
 * The chosen segment is dark with a tick and bold text, so it reads without colour.
 */
export function VentActionControl({ vent, value, onChange, isDisabled }: VentActionControlProps) {
  const name = useId();
  const { name: ventName, detail } = ventWords(vent);
  return (
    <fieldset className="space-y-2" disabled={isDisabled} data-vent={vent.id}>
      <legend className="text-base">
        <span className="font-semibold text-ink-900">{ventName}</span>
        {detail ? <span className="block text-sm text-ink-600">{detail}</span> : null}
      </legend>
      <div className="grid grid-cols-3 overflow-hidden rounded-md border border-ink-400 bg-white">
        {ACTIONS.map((action, i) => (
          <label
            key={action.value}
            className={cn(
              "relative flex min-h-touch cursor-pointer items-center justify-center gap-1.5 px-2 text-base font-medium text-ink-800",
              i > 0 && "border-l border-ink-400",
              "hover:bg-ink-50 has-checked:bg-ink-900 has-checked:font-semibold has-checked:text-white",
              "has-focus-visible:outline-3 has-focus-visible:-outline-offset-4 has-focus-visible:outline-focus",
              "has-disabled:cursor-not-allowed has-disabled:opacity-70",
            )}
          >
            <input
              type="radio"
              name={name}
              value={action.value}
              checked={value === action.value}
              onChange={() => onChange(action.value)}
              className="sr-only"
              aria-label={`${action.label} ${ventName}`}
            />
            {value === action.value ? <span aria-hidden="true">✓</span> : null}
            {action.label}
          </label>
        ))}
      </div>
    </fieldset>
  );
}
