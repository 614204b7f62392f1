import { memo } from "react";
import type { SiteChecklist as Site } from "@shared/schemas/survey";
import { cn } from "@/lib/cn";

type SiteKey = keyof Site;

const ITEMS: { key: SiteKey; label: string; hint?: string }[] = [
  { key: "soffitsBlocked", label: "Insulation blocks the soffit vents", hint: "Look into the rafter bays at the eaves." },
  { key: "bafflesPresent", label: "Baffles (vent chutes) are in the rafter bays" },
  { key: "bathFanIntoAttic", label: "A bath fan vents into the attic" },
  { key: "kitchenOrDryerIntoAttic", label: "A kitchen hood or dryer vents into the attic" },
  { key: "atmosphericCombustionAppliance", label: "An atmospheric (natural-draft) gas appliance is in the house", hint: "Water heater, furnace or boiler with a draft hood." },
  { key: "moistureOrMould", label: "Signs of moisture or mould", hint: "Stained sheathing, frost, rusty nails, damp insulation." },
  { key: "daylightAtRidge", label: "Daylight shows at the ridge" },
  { key: "ceilingAirSealed", label: "The ceiling is air-sealed", hint: "Top plates, penetrations and the hatch." },
];

const CHOICES = [
  { value: true, label: "Yes" },
  { value: false, label: "No" },
  { value: undefined, label: "Not checked" },
] as const;

export interface SiteChecklistProps {
  site: Site;
  onChange: (site: Site) => void;
  isReadOnly: boolean;
}

/** Yes / No / Not checked for each observation: "no" is a finding too, so silence is not "no". */
export const SiteChecklistFields = memo(function SiteChecklistFields({ site, onChange, isReadOnly }: SiteChecklistProps) {
  return (
    <ul className="divide-y divide-ink-100">
      {ITEMS.map((item) => (
        <li key={item.key} className="flex flex-col gap-2 py-3 sm:flex-row sm:items-center sm:justify-between">
          <div className="min-w-0">
            <p id={`site-${item.key}`} className="text-base font-medium text-ink-900">
              {item.label}
            </p>
            {item.hint ? <p className="text-sm text-ink-600">{item.hint}</p> : null}
          </div>
          <div role="radiogroup" aria-labelledby={`site-${item.key}`} className="flex shrink-0 overflow-hidden rounded-md border border-ink-400">
            {CHOICES.map((choice) => {
              const isChecked = site[item.key] === choice.value;
              return (
                <label
                  key={choice.label}
                  className={cn(
                    "flex min-h-touch min-w-16 flex-1 cursor-pointer items-center justify-center border-l border-ink-300 px-3 text-sm first:border-l-0",
                    "has-focus-visible:outline-3 has-focus-visible:-outline-offset-3 has-focus-visible:outline-focus",
                    isChecked ? "bg-ink-800 font-semibold text-white" : "bg-white text-ink-800 hover:bg-ink-50",
                    isReadOnly && "cursor-not-allowed opacity-70",
                  )}
                >
                  <input
                    type="radio"
                    className="sr-only"
                    name={`site-${item.key}`}
                    checked={isChecked}
                    disabled={isReadOnly}
                    onChange={() => {
                      const next = { ...site };
                      if (choice.value === undefined) delete next[item.key];
                      else next[item.key] = choice.value;
                      onChange(next);
                    }}
                  />
                  {isChecked ? <span aria-hidden="true" className="mr-1">✓</span> : null}
                  {choice.label}
                </label>
              );
            })}
          </div>
        </li>
      ))}
    </ul>
  );
});
