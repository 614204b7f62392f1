import type { ReactNode } from "react";
import { FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "@shared/diagnostics/index";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { WarningIcon } from "@/components/ui/icons";
import { cn } from "@/lib/cn";
import type { DiagnosticsDraft } from "../lib/drafts";
import { numberEntry } from "../lib/measure";
import { EntryField } from "./entry-field";

function Caution({ children }: { children: ReactNode }) {
  return (
    <p className="flex gap-2 rounded-md border border-warning-200 bg-warning-50 px-3 py-2 text-sm text-warning-900">
      <WarningIcon className="mt-0.5 size-4 shrink-0 text-warning-600" />
      <span>{children}</span>
    </p>
  );
}

function Step({ number, title, children, isLocked }: { number: number; title: string; children: ReactNode; isLocked?: boolean }) {
  return (
    <li className={cn("space-y-3 rounded-md border border-ink-200 p-3", isLocked && "bg-ink-25")}>
      <h5 className="flex items-baseline gap-2 text-base font-semibold text-ink-900">
        <span className="inline-flex size-6 shrink-0 items-center justify-center rounded-full bg-ink-800 text-xs text-white">{number}</span>
        {title}
        {isLocked ? <span className="text-sm font-normal text-ink-600">(after step 1)</span> : null}
      </h5>
      {children}
    </li>
  );
}

function windingEntry(text: string): DiagnosticsDraft["winding"] {
  if (/^\s*(open|ol|o\.l\.?|inf|infinite)\s*$/i.test(text)) {
    return { text, value: null, error: null, understood: "Open circuit: no continuity through the winding", isOpen: true };
  }
  const entry = numberEntry(text.replace(/\s*(ohms?|Ω)\s*$/i, ""), { allowZero: true, max: 1e12, unit: "ohms" });
  return { ...entry, understood: entry.value !== null ? `${entry.value} Ω` : null, isOpen: false };
}

export interface FanDiagnosticsProps {
  value: DiagnosticsDraft;
  onChange: (value: DiagnosticsDraft) => void;
  fanName: string;
}

/**
 * The fan checks the core interprets, in the only safe order: power verified off with a tester
 * first, and nothing else can be filled in until it is. Each step repeats the cautions.
 */
export function FanDiagnosticsSteps({ value, onChange, fanName }: FanDiagnosticsProps) {
  const isLocked = !value.isPowerVerifiedOff;
  return (
    <section aria-label={`Checks on ${fanName}`} className="space-y-3">
      <h4 className="text-base font-semibold text-ink-900">Fan checks</h4>
      <ol className="space-y-3">
        <Step number={1} title="Power off, verified with a tester">
          <Caution>{FAN_SAFETY_CAUTION}</Caution>
          <Checkbox
            label="The breaker is off and a voltage tester shows no live wire at the fan or thermostat"
            checked={value.isPowerVerifiedOff}
            onChange={(event) => onChange({ ...value, isPowerVerifiedOff: event.target.checked })}
          />
        </Step>
        <Step number={2} title="Blade spins freely" isLocked={isLocked}>
          <Caution>{FAN_SAFETY_CAUTION}</Caution>
          <fieldset disabled={isLocked}>
            <RadioGroup legend="Turned by hand, the blade…" isInline>
              <Radio
                name={`blade-${fanName}`}
                label="Spins freely and coasts"
                checked={value.blade === "free"}
                onChange={() => onChange({ ...value, blade: "free" })}
              />
              <Radio
                name={`blade-${fanName}`}
                label="Is stiff, rough or stuck"
                checked={value.blade === "stuck"}
                onChange={() => onChange({ ...value, blade: "stuck" })}
              />
              <Radio
                name={`blade-${fanName}`}
                label="Not checked"
                checked={value.blade === ""}
                onChange={() => onChange({ ...value, blade: "" })}
              />
            </RadioGroup>
          </fieldset>
        </Step>
        <Step number={3} title="Thermostat switching test" isLocked={isLocked}>
          <Caution>{LIVE_VOLTAGE_TEST_CAUTION}</Caution>
          <Caution>{FAN_SAFETY_CAUTION}</Caution>
          <p className="text-sm text-ink-700">
            Read the voltage at the switched leg (thermostat to motor) with the dial turned below the attic temperature, then above it.
          </p>
          <fieldset disabled={isLocked} className="grid gap-3 sm:grid-cols-3">
            <EntryField
              label="Attic temperature"
              isOptional
              inputMode="decimal"
              suffix="°F"
              showUnderstood={false}
              entry={value.atticTemp}
              onText={(text) => onChange({ ...value, atticTemp: numberEntry(text, { min: -40, max: 180, unit: "°F" }) })}
            />
            <EntryField
              label="Volts, dial below"
              inputMode="decimal"
              suffix="V"
              showUnderstood={false}
              entry={value.voltsBelow}
              onText={(text) => onChange({ ...value, voltsBelow: numberEntry(text, { allowZero: true, max: 300, unit: "volts" }) })}
            />
            <EntryField
              label="Volts, dial above"
              inputMode="decimal"
              suffix="V"
              showUnderstood={false}
              entry={value.voltsAbove}
              onText={(text) => onChange({ ...value, voltsAbove: numberEntry(text, { allowZero: true, max: 300, unit: "volts" }) })}
            />
          </fieldset>
        </Step>
        <Step number={4} title="Motor winding resistance" isLocked={isLocked}>
          <Caution>{FAN_SAFETY_CAUTION}</Caution>
          <fieldset disabled={isLocked}>
            <EntryField
              label="Reading across the winding"
              hint={`Ohms, or "open" when the meter shows OL.`}
              placeholder="e.g. 12 or open"
              entry={value.winding}
              onText={(text) => onChange({ ...value, winding: windingEntry(text) })}
            />
          </fieldset>
        </Step>
      </ol>
    </section>
  );
}
