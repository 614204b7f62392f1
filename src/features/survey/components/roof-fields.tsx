import { memo } from "react";
import type { UnitSystem } from "@shared/units/format";
import { Select } from "@/components/ui/select";
import type { RoofDraft } from "../lib/drafts";
import { lengthEntry, numberEntry } from "../lib/measure";
import { EntryField } from "./entry-field";

const FORMS = [
  { value: "gable", label: "Gable (two slopes, end walls)" },
  { value: "hip", label: "Hip (slopes on all sides)" },
  { value: "shed", label: "Shed (one slope)" },
];

export interface RoofFieldsProps {
  roof: RoofDraft;
  onChange: (roof: RoofDraft) => void;
  unitSystem: UnitSystem;
}

export const RoofFields = memo(function RoofFields({ roof, onChange, unitSystem }: RoofFieldsProps) {
  return (
    <div className="grid gap-4 sm:grid-cols-2">
      <Select
        label="Roof form"
        options={FORMS}
        value={roof.form}
        onChange={(event) => onChange({ ...roof, form: event.target.value as RoofDraft["form"] })}
      />
      <EntryField
        label="Pitch"
        hint="Rise in inches per 12 in of run."
        inputMode="decimal"
        suffix="in 12"
        placeholder="6"
        showUnderstood={false}
        entry={roof.pitch}
        onText={(text) => onChange({ ...roof, pitch: numberEntry(text, { min: 0, max: 24, unit: "inches of rise" }) })}
      />
      <EntryField
        label="Ridge length"
        hint="Ridge available for a ridge vent."
        isOptional
        placeholder={`36'`}
        entry={roof.ridgeLength}
        onText={(text) => onChange({ ...roof, ridgeLength: lengthEntry(text, { system: unitSystem }) })}
      />
      <EntryField
        label="Eave length"
        hint="Eave available for soffit intake, both sides."
        isOptional
        placeholder={`80'`}
        entry={roof.eaveLength}
        onText={(text) => onChange({ ...roof, eaveLength: lengthEntry(text, { system: unitSystem }) })}
      />
    </div>
  );
});
