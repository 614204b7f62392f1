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
      <EntryField
        label="Enclosed rafter bays"
        hint="Cathedral ceiling or ceiling on the rafters: each bay is vented on its own. Leave empty for an open attic."
        isOptional
        inputMode="numeric"
        suffix="bays"
        showUnderstood={false}
        entry={roof.bayCount}
        onText={(text) => onChange({ ...roof, bayCount: numberEntry(text, { isWhole: true, min: 1, max: 500 }) })}
      />
      {roof.bayCount.value !== null || roof.baySpacing.text !== "" ? (
        <EntryField
          label="Rafter spacing"
          hint="On centre, e.g. 16 or 24."
          inputMode="decimal"
          suffix="in"
          showUnderstood={false}
          entry={roof.baySpacing}
          onText={(text) => onChange({ ...roof, baySpacing: numberEntry(text, { min: 8, max: 96, unit: "inches" }) })}
        />
      ) : null}
      <Select
        label="Attic type"
        hint="Sealed: spray foam or rigid board at the roof line, no vents (IRC R806.5)."
        options={[{ value: "unvented", label: "Sealed (unvented), insulated at the roof" }]}
        placeholder="Vented (the usual attic)"
        value={roof.assembly}
        onChange={(event) => onChange({ ...roof, assembly: event.target.value as RoofDraft["assembly"] })}
      />
      {roof.assembly === "unvented" ? (
        <>
          <Select
            label="Insulation at the roof line"
            options={[
              { value: "air-impermeable-only", label: "Spray foam only, against the deck" },
              { value: "air-impermeable-and-air-permeable", label: "Spray foam against the deck, batts or blown below it" },
              { value: "rigid-above-deck-and-air-permeable", label: "Rigid board above the deck, batts below" },
              { value: "air-permeable-only", label: "Batts or blown insulation only" },
            ]}
            placeholder="Choose…"
            value={roof.insulation}
            onChange={(event) => onChange({ ...roof, insulation: event.target.value as RoofDraft["insulation"] })}
          />
          <EntryField
            label="Foam or board R-value"
            hint="Of the spray foam or rigid board alone."
            isOptional
            inputMode="decimal"
            suffix="R"
            showUnderstood={false}
            entry={roof.foamR}
            onText={(text) => onChange({ ...roof, foamR: numberEntry(text, { allowZero: true, max: 100, unit: "R" }) })}
          />
          <Select
            label="Foam is a Class II vapor retarder"
            hint="Closed-cell foam usually is; open-cell needs a vapor-retarder coating."
            options={YES_NO}
            placeholder="Not recorded"
            value={roof.foamIsClassII}
            onChange={(event) => onChange({ ...roof, foamIsClassII: event.target.value as RoofDraft["foamIsClassII"] })}
          />
          <Select
            label="Whole attic inside the insulation"
            hint="Roof-line insulation and air barrier enclose it all."
            options={YES_NO}
            placeholder="Not recorded"
            value={roof.insideEnvelope}
            onChange={(event) => onChange({ ...roof, insideEnvelope: event.target.value as RoofDraft["insideEnvelope"] })}
          />
          <Select
            label="Roof covering"
            options={[
              { value: "asphalt-shingles", label: "Asphalt shingles" },
              { value: "wood-shingles-or-shakes", label: "Wood shingles or shakes" },
              { value: "tile-or-metal", label: "Tile or metal" },
              { value: "other", label: "Other" },
            ]}
            placeholder="Not recorded"
            value={roof.roofCovering}
            onChange={(event) => onChange({ ...roof, roofCovering: event.target.value as RoofDraft["roofCovering"] })}
          />
          {roof.roofCovering === "wood-shingles-or-shakes" ? (
            <Select
              label="1/4 in vented gap under the shakes"
              options={YES_NO}
              placeholder="Not recorded"
              value={roof.shakeGap}
              onChange={(event) => onChange({ ...roof, shakeGap: event.target.value as RoofDraft["shakeGap"] })}
            />
          ) : null}
        </>
      ) : null}
    </div>
  );
});

const YES_NO = [
  { value: "yes", label: "Yes" },
  { value: "no", label: "No" },
];
