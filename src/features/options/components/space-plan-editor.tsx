import { useId, useState } from "react";
import { defaultLocation, isVentCatalogKind } from "@shared/design/index";
import { formatCents } from "@shared/pricing/index";
import type { CatalogItem } from "@shared/schemas/catalog";
import type { VentAction } from "@shared/schemas/options";
import { isPoweredKind } from "@shared/ventilation/index";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { Checkbox } from "@/components/ui/checkbox";
import { TextField } from "@/components/ui/field";
import { CloseIcon, PlusIcon } from "@/components/ui/icons";
import { Select } from "@/components/ui/select";
import type { SpaceRecord } from "../api/types";
import { addedProblems, newId, startingQuantity, type AddedDraft, type SpaceDraft } from "../lib/draft";
import { VentActionControl, ventWords } from "./vent-action-control";

const UNIT_WORD = { each: "each", "linear-ft": "ft", hour: "h" } as const;
const PER = { each: "each", "linear-ft": "per ft", hour: "per hour" } as const;

function itemLabel(item: CatalogItem): string {
  return `${item.name} · ${formatCents(item.sellPriceCents)} ${PER[item.unit]}${item.isActive ? "" : " (retired)"}`;
}

export interface SpacePlanEditorProps {
  space: SpaceRecord;
  plan: SpaceDraft;
  catalog: readonly CatalogItem[];
  isReadOnly: boolean;
  onChange: (plan: SpaceDraft) => void;
}

/** One attic space of the option: what happens to each surveyed vent, what is added, site fixes. */
export function SpacePlanEditor({ space, plan, catalog, isReadOnly, onChange }: SpacePlanEditorProps) {
  const headingId = useId();
  const [toAdd, setToAdd] = useState("");
  const byId = new Map(catalog.map((i) => [i.id, i]));
  const active = catalog.filter((i) => i.isActive);
  const ventItems = active.filter((i) => isVentCatalogKind(i.kind));

  const setAction = (ventId: string, action: VentAction) => {
    const ventActions = { ...plan.ventActions, [ventId]: action };
    // Leaving "replace" drops the replacement that was chosen for this vent.
    const added = action === "replace" ? plan.added : plan.added.filter((a) => a.replacesVentId !== ventId);
    onChange({ ...plan, ventActions, added });
  };
  const setAdded = (id: string, patch: Partial<AddedDraft>) => onChange({ ...plan, added: plan.added.map((a) => (a.id === id ? { ...a, ...patch } : a)) });
  const removeAdded = (id: string) => onChange({ ...plan, added: plan.added.filter((a) => a.id !== id) });
  const addItem = (catalogItemId: string, extra: Partial<AddedDraft> = {}) =>
    onChange({ ...plan, added: [...plan.added, { id: newId(), catalogItemId, quantity: "1", location: "", drop: "", ...extra }] });

  const hasGableFan = space.vents.some((v) => v.kind === "powered-gable" || v.mounting === "gable");
  return (
    <Card aria-labelledby={headingId}>
      <CardHeader>
        <CardTitle id={headingId}>{space.name}</CardTitle>
        <CardDescription>Choose what happens to each vent found in the survey, then add what the fix needs.</CardDescription>
      </CardHeader>
      <CardBody className="space-y-6">
        <section className="space-y-4">
          <h3 className="text-base font-semibold text-ink-900">Existing vents</h3>
          {space.vents.length === 0 ? <p className="text-base text-ink-700">The survey found no vents in this space.</p> : null}
          {space.vents.map((vent) => {
            const action = plan.ventActions[vent.id] ?? "keep";
            const replacement = plan.added.find((a) => a.replacesVentId === vent.id);
            return (
              <div key={vent.id} className="space-y-3 rounded-lg border border-ink-200 p-3">
                <VentActionControl vent={vent} value={action} onChange={(a) => setAction(vent.id, a)} isDisabled={isReadOnly} />
                {action === "replace" && !replacement && !isReadOnly ? (
                  <Select
                    label={`Replace ${ventWords(vent).name} with`}
                    placeholder="Choose a vent from the catalog"
                    options={ventItems.map((i) => ({ value: i.id, label: itemLabel(i) }))}
                    value=""
                    onChange={(e) =>
                      e.target.value &&
                      addItem(e.target.value, { quantity: startingQuantity(vent), replacesVentId: vent.id, location: vent.location })
                    }
                  />
                ) : null}
                {action === "replace" && replacement ? (
                  <p className="text-sm text-ink-700">Replaced by {byId.get(replacement.catalogItemId)?.name ?? "a catalog item"} (below).</p>
                ) : null}
                {action !== "keep" && isPoweredKind(vent.kind) ? (
                  <p className="text-sm text-warning-900">
                    ! A licensed electrician disconnects the fan's power. Add the disconnect and the patch or seal of its opening.
                  </p>
                ) : null}
              </div>
            );
          })}
        </section>

        <section className="space-y-4">
          <h3 className="text-base font-semibold text-ink-900">Added items</h3>
          {plan.added.length === 0 ? <p className="text-base text-ink-700">Nothing added yet.</p> : null}
          {plan.added.map((a) => (
            <AddedRow
              key={a.id}
              added={a}
              item={byId.get(a.catalogItemId)}
              catalog={catalog}
              replacesName={a.replacesVentId ? (space.vents.find((v) => v.id === a.replacesVentId) ? ventWords(space.vents.find((v) => v.id === a.replacesVentId)!).name : null) : null}
              isReadOnly={isReadOnly}
              onChange={(patch) => setAdded(a.id, patch)}
              onRemove={() => removeAdded(a.id)}
            />
          ))}
          {!isReadOnly ? (
            <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
              <Select
                label="Add from the catalog"
                className="flex-1"
                placeholder="Choose an item"
                options={active.map((i) => ({ value: i.id, label: itemLabel(i) }))}
                value={toAdd}
                onChange={(e) => setToAdd(e.target.value)}
              />
              <Button
                variant="secondary"
                icon={<PlusIcon />}
                disabled={!toAdd}
                onClick={() => {
                  addItem(toAdd);
                  setToAdd("");
                }}
              >
                Add item
              </Button>
            </div>
          ) : null}
        </section>

        <section className="space-y-1">
          <h3 className="text-base font-semibold text-ink-900">Site fixes</h3>
          <Checkbox
            label="Clear blocked soffits and fit baffles"
            description="The analysis counts the soffit intake as open."
            checked={plan.siteFixes.clearsBlockedSoffits === true}
            disabled={isReadOnly}
            onChange={(e) => onChange({ ...plan, siteFixes: { ...plan.siteFixes, clearsBlockedSoffits: e.target.checked } })}
          />
          {hasGableFan ? (
            <Checkbox
              label="Seal the gable fan to its opening"
              description="Stops the fan drawing air from the gable louver beside it."
              checked={plan.siteFixes.sealsGableFan === true}
              disabled={isReadOnly}
              onChange={(e) => onChange({ ...plan, siteFixes: { ...plan.siteFixes, sealsGableFan: e.target.checked } })}
            />
          ) : null}
        </section>
      </CardBody>
    </Card>
  );
}

interface AddedRowProps {
  added: AddedDraft;
  item: CatalogItem | undefined;
  catalog: readonly CatalogItem[];
  replacesName: string | null;
  isReadOnly: boolean;
  onChange: (patch: Partial<AddedDraft>) => void;
  onRemove: () => void;
}

function AddedRow({ added, item, catalog, replacesName, isReadOnly, onChange, onRemove }: AddedRowProps) {
  const problems = addedProblems(added, item);
  const isVent = item ? isVentCatalogKind(item.kind) : false;
  const options = catalog
    .filter((i) => i.isActive || i.id === added.catalogItemId)
    .map((i) => ({ value: i.id, label: itemLabel(i) }));
  const name = item?.name ?? "Item";
  const usual = item && isVentCatalogKind(item.kind) ? (defaultLocation(item.kind) === "lower" ? "low" : "high") : null;
  return (
    <div className="space-y-3 rounded-lg border border-ink-200 bg-ink-25 p-3" data-added-item={name}>
      <Select
        label="Item"
        options={options}
        value={added.catalogItemId}
        disabled={isReadOnly}
        error={problems.item}
        onChange={(e) => onChange({ catalogItemId: e.target.value })}
      />
      {replacesName ? <p className="text-sm text-ink-700">Replaces {replacesName}.</p> : null}
      <div className="grid grid-cols-2 gap-3">
        <TextField
          label={
            <>
              Quantity<span className="sr-only"> of {name}</span>
            </>
          }
          inputMode="decimal"
          autoComplete="off"
          value={added.quantity}
          readOnly={isReadOnly}
          error={problems.quantity}
          trailing={item ? <span className="pr-3 text-sm text-ink-600">{UNIT_WORD[item.unit]}</span> : undefined}
          onChange={(e) => onChange({ quantity: e.target.value })}
        />
        {isVent ? (
          <Select
            label="Where"
            options={[
              { value: "", label: usual ? `Usual place (${usual})` : "Usual place" },
              { value: "upper", label: "High (exhaust)" },
              { value: "lower", label: "Low (intake)" },
            ]}
            value={added.location}
            disabled={isReadOnly}
            onChange={(e) => onChange({ location: e.target.value as AddedDraft["location"] })}
          />
        ) : null}
        {isVent && added.location !== "lower" ? (
          <TextField
            label="Below the ridge"
            isOptional
            inputMode="decimal"
            autoComplete="off"
            value={added.drop}
            readOnly={isReadOnly}
            error={problems.drop}
            trailing={<span className="pr-3 text-sm text-ink-600">ft</span>}
            onChange={(e) => onChange({ drop: e.target.value })}
          />
        ) : null}
      </div>
      {!isReadOnly ? (
        <div className="flex justify-end">
          <Button variant="ghost" size="sm" icon={<CloseIcon />} className="text-critical-700 hover:bg-critical-50" onClick={onRemove}>
            Remove<span className="sr-only"> {name}</span>
          </Button>
        </div>
      ) : null}
    </div>
  );
}
