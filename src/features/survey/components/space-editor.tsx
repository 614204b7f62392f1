import type { ReactNode } from "react";
import type { UnitSystem } from "@shared/units/format";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { TextArea, TextField } from "@/components/ui/field";
import type { SpaceDraft } from "../lib/drafts";
import { PlanSketch } from "./plan-sketch";
import { RoofFields } from "./roof-fields";
import { SectionsEditor } from "./sections-editor";
import { SiteChecklistFields } from "./site-checklist";
import { VentsEditor } from "./vents-editor";

export interface SpaceEditorProps {
  draft: SpaceDraft;
  onChange: (draft: SpaceDraft) => void;
  unitSystem: UnitSystem;
  isReadOnly: boolean;
  typicalIds: string[];
  onTypicalChange: (ids: string[]) => void;
  otherSpaces: { id: string; name: string; ventCount: number }[];
  onCopyFrom: (spaceId: string) => void;
  onDelete: () => void;
  /** The photos panel, built by the page. */
  photos: ReactNode;
}

/** Everything recorded for one attic space, top to bottom in the order it is surveyed. */
export function SpaceEditor({
  draft,
  onChange,
  unitSystem,
  isReadOnly,
  typicalIds,
  onTypicalChange,
  otherSpaces,
  onCopyFrom,
  onDelete,
  photos,
}: SpaceEditorProps) {
  return (
    <div className="space-y-5">
      <Card>
        <CardBody className="flex flex-col gap-3 sm:flex-row sm:items-end">
          <TextField
            label="Space name"
            value={draft.name}
            disabled={isReadOnly}
            error={draft.name.trim() === "" ? "Name the space (e.g. Main attic)." : undefined}
            onChange={(event) => onChange({ ...draft, name: event.target.value })}
            className="flex-1"
          />
          {isReadOnly ? null : (
            <Button variant="ghost" className="text-critical-700 hover:bg-critical-50" onClick={onDelete}>
              Delete space
            </Button>
          )}
        </CardBody>
      </Card>

      <fieldset disabled={isReadOnly} className="space-y-5">
        <Card aria-labelledby={`roof-${draft.id}`}>
          <CardHeader>
            <CardTitle id={`roof-${draft.id}`}>Roof</CardTitle>
          </CardHeader>
          <CardBody>
            <RoofFields roof={draft.roof} onChange={(roof) => onChange({ ...draft, roof })} unitSystem={unitSystem} />
          </CardBody>
        </Card>

        <Card aria-labelledby={`floor-${draft.id}`}>
          <CardHeader>
            <CardTitle id={`floor-${draft.id}`}>Attic floor</CardTitle>
            <CardDescription>
              Type lengths as you read the tape: 24&apos; 6&quot;, 24 ft 6 in, 7.5 m or 750 cm. Each field shows what it understood.
            </CardDescription>
          </CardHeader>
          <CardBody className="space-y-5">
            <PlanSketch sections={draft.sections} unitSystem={unitSystem} />
            <SectionsEditor
              sections={draft.sections}
              onChange={(sections) => onChange({ ...draft, sections })}
              unitSystem={unitSystem}
              isReadOnly={isReadOnly}
            />
          </CardBody>
        </Card>

        <Card aria-labelledby={`vents-${draft.id}`}>
          <CardHeader>
            <CardTitle id={`vents-${draft.id}`}>Existing vents</CardTitle>
            <CardDescription>Every vent and fan in this space, with the size its label or your tape gives.</CardDescription>
          </CardHeader>
          <CardBody>
            <VentsEditor
              vents={draft.vents}
              onChange={(vents) => onChange({ ...draft, vents })}
              unitSystem={unitSystem}
              ridgeLengthFt={draft.roof.ridgeLength.value}
              eaveLengthFt={draft.roof.eaveLength.value}
              typicalIds={typicalIds}
              onTypicalChange={onTypicalChange}
              otherSpaces={otherSpaces}
              onCopyFrom={onCopyFrom}
              isReadOnly={isReadOnly}
            />
          </CardBody>
        </Card>

        <Card aria-labelledby={`site-${draft.id}`}>
          <CardHeader>
            <CardTitle id={`site-${draft.id}`}>Site checklist</CardTitle>
            <CardDescription>What you saw in this space. "Not checked" is fine; it isn't counted as a no.</CardDescription>
          </CardHeader>
          <CardBody>
            <SiteChecklistFields site={draft.site} onChange={(site) => onChange({ ...draft, site })} isReadOnly={isReadOnly} />
          </CardBody>
        </Card>
      </fieldset>

      <Card aria-labelledby={`photos-${draft.id}`}>
        <CardHeader>
          <CardTitle id={`photos-${draft.id}`}>Photos</CardTitle>
        </CardHeader>
        <CardBody>{photos}</CardBody>
      </Card>

      <Card>
        <CardBody>
          <TextArea
            label="Notes on this space"
            isOptional
            rows={3}
            disabled={isReadOnly}
            value={draft.notes}
            onChange={(event) => onChange({ ...draft, notes: event.target.value })}
          />
        </CardBody>
      </Card>
    </div>
  );
}
