import { memo, useCallback, useState } from "react";
import type { UnitSystem } from "@shared/units/format";
import { formatNfaSqIn } from "@shared/units/format";
import { VENT_KIND_LABELS, VENT_KINDS, ventNfa, type VentKind } from "@shared/ventilation/index";
import { Badge } from "@/components/ui/badge";
import { Button } from "@/components/ui/button";
import { Checkbox, Radio, RadioGroup } from "@/components/ui/checkbox";
import { ConfirmDialog } from "@/components/ui/dialog";
import { TextField } from "@/components/ui/field";
import { CloseIcon, PlusIcon, WarningIcon } from "@/components/ui/icons";
import { Select } from "@/components/ui/select";
import { buildVent, DEFAULT_LOCATION, emptyVent, SIZE_MODE, ventName, type VentDraft } from "../lib/drafts";
import { inchEntry, lengthEntry, numberEntry } from "../lib/measure";
import { VENT_PRESETS } from "../lib/vent-presets";
import { EntryField } from "./entry-field";
import { FanDiagnosticsSteps } from "./fan-diagnostics";
import { RemainingProblems } from "./remaining-problems";

const capital = (s: string) => s.charAt(0).toUpperCase() + s.slice(1);
const KIND_OPTIONS = VENT_KINDS.map((k) => ({ value: k, label: capital(VENT_KIND_LABELS[k]) }));
const CONTROL_OPTIONS = [
  { value: "thermostat", label: "Thermostat" },
  { value: "thermostat-and-humidistat", label: "Thermostat and humidistat" },
  { value: "switch", label: "Wall switch" },
  { value: "always-on", label: "Always on" },
  { value: "solar", label: "Solar (runs with sun)" },
];

const CONDITION_OPTIONS = [
  { value: "open", label: "Open, clear" },
  { value: "partly-blocked", label: "Partly blocked" },
  { value: "blocked", label: "Blocked" },
  { value: "painted-over", label: "Painted over" },
  { value: "damaged", label: "Damaged (broken, torn screen)" },
];
const BLOCKED_BY_OPTIONS = [
  { value: "insulation", label: "Insulation" },
  { value: "paint", label: "Paint" },
  { value: "debris", label: "Debris" },
  { value: "nest", label: "A nest" },
  { value: "other", label: "Something else" },
];

type VentsUpdate = (vents: VentDraft[]) => VentDraft[];
type VentUpdate = (vent: VentDraft) => VentDraft;

export interface VentsEditorProps {
  vents: VentDraft[];
  /** Given a function of the current vents, so the callbacks below stay the same from render to render. */
  onChange: (update: VentsUpdate) => void;
  unitSystem: UnitSystem;
  ridgeLengthFt: number | null;
  eaveLengthFt: number | null;
  /** Vent ids still holding quick-add typical values. */
  typicalIds: string[];
  onTypicalChange: (ids: string[]) => void;
  /** Other spaces of this project that have vents, to copy from. */
  otherSpaces: { id: string; name: string; ventCount: number }[];
  onCopyFrom: (spaceId: string) => void;
  isReadOnly?: boolean;
}

export const VentsEditor = memo(function VentsEditor({
  vents,
  onChange,
  unitSystem,
  ridgeLengthFt,
  eaveLengthFt,
  typicalIds,
  onTypicalChange,
  otherSpaces,
  onCopyFrom,
  isReadOnly = false,
}: VentsEditorProps) {
  const [otherKind, setOtherKind] = useState<VentKind>("off-ridge");
  const [copyFrom, setCopyFrom] = useState("");
  const [toRemove, setToRemove] = useState<number | null>(null);

  const add = (vent: VentDraft, isTypical: boolean) => {
    onChange((list) => [...list, vent]);
    if (isTypical) onTypicalChange([...typicalIds, vent.id]);
    // Bring the new vent into view so the typical values can be checked straight away.
    setTimeout(() => document.getElementById(`part-${vent.id}`)?.scrollIntoView({ behavior: "smooth", block: "start" }), 50);
  };
  // Keyed by id and stable, so editing one vent leaves the other (memoised) cards alone.
  const updateVent = useCallback(
    (ventId: string, update: VentUpdate) => onChange((list) => list.map((v) => (v.id === ventId ? update(v) : v))),
    [onChange],
  );
  const markChecked = useCallback((ventId: string) => onTypicalChange(typicalIds.filter((id) => id !== ventId)), [onTypicalChange, typicalIds]);
  const copyable = otherSpaces.filter((s) => s.ventCount > 0);

  return (
    <div className="space-y-5">
      <div className={isReadOnly ? "hidden" : "space-y-2"}>
        <h4 className="text-base font-semibold text-ink-900">Quick add</h4>
        <p className="text-sm text-ink-700">Starts with typical values, marked until you check them against the product label.</p>
        <div className="grid grid-cols-2 gap-2 xl:grid-cols-4">
          {VENT_PRESETS.map((preset) => (
            <Button
              key={preset.kind}
              variant="secondary"
              className="h-auto! min-h-touch justify-start px-3 py-2 text-left leading-snug whitespace-normal"
              icon={<PlusIcon />}
              onClick={() => add(preset.make({ ridgeLengthFt, eaveLengthFt, system: unitSystem }), true)}
            >
              {preset.label}
            </Button>
          ))}
        </div>
        <div className="flex flex-wrap items-end gap-2 pt-1">
          <Select
            label="Other kind"
            options={KIND_OPTIONS}
            value={otherKind}
            onChange={(event) => setOtherKind(event.target.value as VentKind)}
            className="min-w-56 flex-1 sm:flex-none"
          />
          <Button variant="secondary" icon={<PlusIcon />} onClick={() => add(emptyVent(otherKind), false)}>
            Add
          </Button>
        </div>
        {copyable.length > 0 ? (
          <div className="flex flex-wrap items-end gap-2 pt-1">
            <Select
              label="Copy vents from another space"
              options={copyable.map((s) => ({ value: s.id, label: `${s.name} (${s.ventCount} vent${s.ventCount === 1 ? "" : "s"})` }))}
              placeholder="Choose a space"
              value={copyFrom}
              onChange={(event) => setCopyFrom(event.target.value)}
              className="min-w-56 flex-1 sm:flex-none"
            />
            <Button
              variant="secondary"
              disabled={!copyFrom}
              onClick={() => {
                onCopyFrom(copyFrom);
                setCopyFrom("");
              }}
            >
              Copy vents
            </Button>
          </div>
        ) : null}
      </div>

      {vents.length === 0 ? <p className="text-base text-ink-700">No vents recorded yet in this space.</p> : null}
      <ol className="space-y-4">
        {vents.map((vent, index) => (
          <li key={vent.id}>
            <VentCard
              vent={vent}
              index={index}
              unitSystem={unitSystem}
              isTypical={!isReadOnly && typicalIds.includes(vent.id)}
              isReadOnly={isReadOnly}
              onChecked={markChecked}
              onUpdate={updateVent}
              onRemove={setToRemove}
            />
          </li>
        ))}
      </ol>
      <ConfirmDialog
        open={toRemove !== null}
        onOpenChange={(open) => (open ? undefined : setToRemove(null))}
        title={`Remove ${toRemove !== null && vents[toRemove] ? ventName(vents[toRemove], toRemove) : "this vent"}?`}
        description="Its sizes and any fan checks are removed from this space. Photos of it stay on the project."
        confirmLabel="Remove vent"
        confirmVariant="danger"
        onConfirm={() => {
          if (toRemove === null) return;
          const id = vents[toRemove]?.id;
          onChange((list) => list.filter((_, i) => i !== toRemove));
          if (id) onTypicalChange(typicalIds.filter((t) => t !== id));
          setToRemove(null);
        }}
      />
    </div>
  );
});

const VentCard = memo(function VentCard({
  vent,
  index,
  unitSystem,
  isTypical,
  onChecked,
  onUpdate,
  onRemove,
  isReadOnly,
}: {
  isReadOnly: boolean;
  vent: VentDraft;
  index: number;
  unitSystem: UnitSystem;
  isTypical: boolean;
  onChecked: (ventId: string) => void;
  onUpdate: (ventId: string, update: VentUpdate) => void;
  onRemove: (index: number) => void;
}) {
  const edit = (patch: Partial<VentDraft>) => onUpdate(vent.id, (v) => ({ ...v, ...patch }));
  const mode = SIZE_MODE[vent.kind];
  const name = ventName(vent, index);
  const built = buildVent(vent);
  // Messages already shown under their own field aren't repeated in the list below.
  const fieldErrors = Object.values(vent).filter((v): v is { error: string | null } => typeof v === "object" && v !== null && "error" in v).flatMap((e) => (e.error ? [e.error] : []));
  const nfa = built.vent ? ventNfa(built.vent) : null;
  const hasTyped = [vent.length, vent.nfaPerFt, vent.quantity, vent.nfaPerUnit, vent.grossWidth, vent.grossHeight, vent.cfm].some((e) => e.text);

  return (
    <section id={`part-${vent.id}`} aria-label={name} className="space-y-4 rounded-lg border border-ink-200 bg-white p-4 scroll-mt-24">
      <div className="flex items-start justify-between gap-3">
        <div className="min-w-0 space-y-1">
          <h4 className="text-base font-semibold text-ink-900">{name}</h4>
          {nfa ? (
            <p className="text-sm text-ink-700">
              {nfa.isPowered ? nfa.explanation : `${nfa.explanation}${unitSystem === "metric" ? ` (${formatNfaSqIn(nfa.nfaSqIn, "metric")})` : ""}`}
            </p>
          ) : null}
        </div>
        {isReadOnly ? null : (
          <Button variant="ghost" size="icon" aria-label={`Remove ${name}`} onClick={() => onRemove(index)} className="-mt-2 -mr-2 shrink-0">
            <CloseIcon />
          </Button>
        )}
      </div>
      {isTypical ? (
        <div className="flex flex-wrap items-center gap-3 rounded-md border border-warning-200 bg-warning-50 px-3 py-2">
          <WarningIcon className="size-4 text-warning-600" />
          <Badge tone="outline">Typical values</Badge>
          <span className="flex-1 text-sm text-warning-900">Check these against the product label.</span>
          <Button variant="secondary" size="sm" onClick={() => onChecked(vent.id)}>
            Checked against label
          </Button>
        </div>
      ) : null}
      <div className="grid gap-4 sm:grid-cols-2">
        <Select
          label="Kind"
          options={KIND_OPTIONS}
          value={vent.kind}
          onChange={(event) => {
            const kind = event.target.value as VentKind;
            edit({ kind, location: DEFAULT_LOCATION[kind] });
          }}
        />
        <TextField
          label="Where it is"
          isOptional
          placeholder="e.g. North slope, garage gable"
          value={vent.label}
          onChange={(event) => edit({ label: event.target.value })}
        />
      </div>
      <RadioGroup legend="Position" isInline>
        <Radio
          name={`loc-${vent.id}`}
          label="Upper (exhaust)"
          description="High on the roof or gable"
          checked={vent.location === "upper"}
          onChange={() => edit({ location: "upper" })}
        />
        <Radio
          name={`loc-${vent.id}`}
          label="Lower (intake)"
          description="At the eaves or soffits"
          checked={vent.location === "lower"}
          onChange={() => edit({ location: "lower" })}
        />
      </RadioGroup>

      {mode === "linear" ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <EntryField
            label="Length installed"
            hint="Measured along the vent."
            placeholder={`34'`}
            entry={vent.length}
            onText={(text) => edit({ length: lengthEntry(text, { system: unitSystem }) })}
          />
          <EntryField
            label="NFA per foot"
            hint="From the product label."
            inputMode="decimal"
            suffix="sq in/ft"
            showUnderstood={false}
            entry={vent.nfaPerFt}
            onText={(text) => edit({ nfaPerFt: numberEntry(text, { max: 200, unit: "sq in per foot" }) })}
          />
        </div>
      ) : mode === "per-unit" ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <EntryField
            label="Count"
            inputMode="numeric"
            showUnderstood={false}
            entry={vent.quantity}
            onText={(text) => edit({ quantity: numberEntry(text, { isWhole: true, min: 1, max: 1000 }) })}
          />
          <EntryField
            label="NFA of each"
            hint="From the product label."
            inputMode="decimal"
            suffix="sq in"
            showUnderstood={false}
            entry={vent.nfaPerUnit}
            onText={(text) => edit({ nfaPerUnit: numberEntry(text, { max: 100_000, unit: "sq in" }) })}
          />
        </div>
      ) : mode === "gross" ? (
        <div className="space-y-4">
          <div className="grid gap-4 sm:grid-cols-2">
            <EntryField
              label="Opening width"
              hint="Gross size, in inches unless you say otherwise."
              inputMode="decimal"
              entry={vent.grossWidth}
              onText={(text) => edit({ grossWidth: inchEntry(text) })}
            />
            <EntryField
              label="Opening height"
              hint="Gross size, in inches unless you say otherwise."
              inputMode="decimal"
              entry={vent.grossHeight}
              onText={(text) => edit({ grossHeight: inchEntry(text) })}
            />
          </div>
          <div className="grid gap-4 sm:grid-cols-2">
            <Select
              label="Mesh over the opening"
              options={[
                { value: "1/4", label: "1/4 in hardware cloth" },
                { value: "1/8", label: "1/8 in mesh" },
                { value: "1/16", label: "1/16 in insect screen" },
              ]}
              value={vent.mesh}
              onChange={(event) => edit({ mesh: event.target.value as VentDraft["mesh"] })}
            />
            <Checkbox
              label="Has louvers"
              description="Slats that shed rain reduce the free area further."
              checked={vent.louvers}
              onChange={(event) => edit({ louvers: event.target.checked })}
              className="sm:pt-7"
            />
            {vent.louvers ? (
              <Select
                label="Louvers made of"
                hint="Behind insect screen, plain metal louvers take less area than wood ones."
                options={[
                  { value: "metal", label: "Metal (plain)" },
                  { value: "wood", label: "Wood" },
                ]}
                placeholder="Not recorded (taken as wood)"
                value={vent.louverMaterial}
                onChange={(event) => edit({ louverMaterial: event.target.value as VentDraft["louverMaterial"] })}
              />
            ) : null}
          </div>
        </div>
      ) : (
        <div className="space-y-4">
          <div className="grid gap-4 sm:grid-cols-2">
            <EntryField
              label="Rated airflow"
              hint="From the fan's label."
              inputMode="decimal"
              suffix="cfm"
              showUnderstood={false}
              entry={vent.cfm}
              onText={(text) => edit({ cfm: numberEntry(text, { max: 50_000, unit: "cfm" }) })}
            />
            <EntryField
              label="How many"
              hint="Leave empty for one."
              isOptional
              inputMode="numeric"
              showUnderstood={false}
              entry={vent.quantity}
              onText={(text) => edit({ quantity: numberEntry(text, { isWhole: true, min: 1, max: 1000 }) })}
            />
            {vent.kind === "whole-house-fan" ? (
              <p className="text-sm text-ink-700 sm:col-span-2">
                A whole-house fan sits in a ceiling and blows house air into the attic; every attic vent lets it out. It must only run with windows open.
              </p>
            ) : (
              <Select
                label="Mounting"
                options={[
                  { value: "roof", label: "On the roof" },
                  { value: "gable", label: "In a gable wall" },
                ]}
                placeholder="Not recorded"
                value={vent.mounting}
                onChange={(event) => edit({ mounting: event.target.value as VentDraft["mounting"] })}
              />
            )}
            <Select
              label="Control"
              options={CONTROL_OPTIONS}
              placeholder="Not recorded"
              value={vent.control}
              onChange={(event) => edit({ control: event.target.value as VentDraft["control"] })}
            />
            <EntryField
              label="Thermostat set point"
              isOptional
              inputMode="decimal"
              suffix="°F"
              showUnderstood={false}
              entry={vent.setPoint}
              onText={(text) => edit({ setPoint: numberEntry(text, { min: 40, max: 180, unit: "°F" }) })}
            />
            {vent.mounting === "gable" || vent.kind === "powered-gable" ? (
              <Select
                label="Sealed to its opening"
                hint="A shroud or baffle so it can't pull air back in around itself."
                options={[
                  { value: "yes", label: "Yes, sealed" },
                  { value: "no", label: "No, gaps around it" },
                ]}
                placeholder="Not checked"
                value={vent.sealedToOpening}
                onChange={(event) => edit({ sealedToOpening: event.target.value as VentDraft["sealedToOpening"] })}
              />
            ) : null}
          </div>
        </div>
      )}
      {mode !== "powered" ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <Select
            label="Condition"
            options={CONDITION_OPTIONS}
            placeholder="Open (not checked)"
            value={vent.condition}
            onChange={(event) => edit({ condition: event.target.value as VentDraft["condition"] })}
          />
          {vent.condition === "partly-blocked" || vent.condition === "blocked" ? (
            <Select
              label="Blocked by"
              options={BLOCKED_BY_OPTIONS}
              placeholder="Not recorded"
              value={vent.blockedBy}
              onChange={(event) => edit({ blockedBy: event.target.value as VentDraft["blockedBy"] })}
            />
          ) : null}
          {vent.condition === "partly-blocked" && mode === "per-unit" ? (
            <EntryField
              label="How many are blocked"
              hint={`Of the count above, e.g. 4 of 10.`}
              inputMode="numeric"
              showUnderstood={false}
              entry={vent.blockedCount}
              onText={(text) => edit({ blockedCount: numberEntry(text, { isWhole: true, allowZero: true, max: 1000 }) })}
            />
          ) : null}
          {vent.condition === "partly-blocked" && mode !== "per-unit" ? (
            <EntryField
              label="Share blocked"
              hint="About how much of the vent is covered."
              inputMode="decimal"
              suffix="%"
              showUnderstood={false}
              entry={vent.blockedPercent}
              onText={(text) => edit({ blockedPercent: numberEntry(text, { allowZero: true, max: 100, unit: "percent" }) })}
            />
          ) : null}
        </div>
      ) : null}
      <EntryField
        label="Drop below the ridge"
        hint="Height from the ridge down to this vent; 0 at the ridge."
        isOptional
        placeholder={`2'`}
        entry={vent.drop}
        onText={(text) => edit({ drop: lengthEntry(text, { allowZero: true, system: unitSystem }) })}
        className="sm:max-w-xs"
      />
      {mode === "powered" ? (
        <FanDiagnosticsSteps value={vent.diagnostics} fanName={name} onChange={(diagnostics) => edit({ diagnostics })} />
      ) : null}
      {hasTyped ? <RemainingProblems problems={built.problems} fieldErrors={fieldErrors} /> : null}
    </section>
  );
});
