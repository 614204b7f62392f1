import type { ReactNode } from "react";
import { CAPACITOR_CAUTION, FAN_SAFETY_CAUTION, LIVE_VOLTAGE_TEST_CAUTION } from "@shared/diagnostics/index";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { WarningIcon } from "@/components/ui/icons";
import { Select } from "@/components/ui/select";
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

const YES_NO_UNKNOWN = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
];

function windingEntry(text: string, openWords = "Open circuit: no continuity through the winding"): DiagnosticsDraft["winding"] {
  if (/^\s*(open|ol|o\.l\.?|inf|infinite)\s*$/i.test(text)) {
    return { text, value: null, error: null, understood: openWords, isOpen: true };
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
          <div className="grid gap-3 sm:grid-cols-2">
            <Select
              label="Breaker locked or tagged off"
              options={YES_NO_UNKNOWN}
              placeholder="Not recorded"
              value={value.isLockedOut}
              onChange={(event) => onChange({ ...value, isLockedOut: event.target.value as DiagnosticsDraft["isLockedOut"] })}
            />
            <Select
              label="Tester proven on a known live source, before and after"
              options={YES_NO_UNKNOWN}
              placeholder="Not recorded"
              value={value.isTesterProven}
              onChange={(event) => onChange({ ...value, isTesterProven: event.target.value as DiagnosticsDraft["isTesterProven"] })}
            />
          </div>
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
            <EntryField
              label="Winding to motor frame"
              hint={`Ohms from a lead to the bare metal frame, or "open" when the meter shows OL (that is good).`}
              isOptional
              placeholder="e.g. open"
              entry={value.windingToGround}
              onText={(text) => onChange({ ...value, windingToGround: windingEntry(text, "Open (OL): no leak to the frame") })}
            />
          </fieldset>
        </Step>
        <Step number={5} title="Run capacitor (if the motor has one)" isLocked={isLocked}>
          <Caution>{CAPACITOR_CAUTION}</Caution>
          <fieldset disabled={isLocked} className="grid gap-3 sm:grid-cols-3">
            <Select
              label="Motor has a capacitor"
              hint="Most small attic fan motors are shaded-pole and have none."
              options={[
                { value: "yes", label: "Yes" },
                { value: "no", label: "No (shaded-pole)" },
              ]}
              placeholder="Not checked"
              value={value.hasCapacitor}
              onChange={(event) => onChange({ ...value, hasCapacitor: event.target.value as DiagnosticsDraft["hasCapacitor"] })}
            />
            {value.hasCapacitor === "yes" ? (
              <>
                <EntryField
                  label="Rating on its label"
                  inputMode="decimal"
                  suffix="µF"
                  showUnderstood={false}
                  entry={value.capacitorRated}
                  onText={(text) => onChange({ ...value, capacitorRated: numberEntry(text, { max: 1000, unit: "µF" }) })}
                />
                <EntryField
                  label="Reading"
                  inputMode="decimal"
                  suffix="µF"
                  showUnderstood={false}
                  entry={value.capacitorMeasured}
                  onText={(text) => onChange({ ...value, capacitorMeasured: numberEntry(text, { allowZero: true, max: 2000, unit: "µF" }) })}
                />
              </>
            ) : null}
          </fieldset>
        </Step>
        <Step number={6} title="Fan starts when forced on">
          <Caution>{LIVE_VOLTAGE_TEST_CAUTION}</Caution>
          <Select
            label="Dial turned below the attic temperature (or override used): the fan…"
            options={[
              { value: "runs", label: "Starts and runs" },
              { value: "does-not-run", label: "Does not start" },
            ]}
            placeholder="Not tested"
            value={value.overrideTest}
            onChange={(event) => onChange({ ...value, overrideTest: event.target.value as DiagnosticsDraft["overrideTest"] })}
          />
        </Step>
      </ol>
    </section>
  );
}
