import { memo, useCallback, type ReactNode } from "react";
import type { SiteChecklist } from "@shared/schemas/survey";
import type { UnitSystem } from "@shared/units/format";
import { Button } from "@/components/ui/button";
import { Card, CardBody, CardDescription, CardHeader, CardTitle } from "@/components/ui/card";
import { TextArea, TextField } from "@/components/ui/field";
import type { RoofDraft, SectionDraft, SpaceDraft, VentDraft } from "../lib/drafts";
import { PlanSketch } from "./plan-sketch";
import { RoofFields } from "./roof-fields";
import { SectionsEditor } from "./sections-editor";
import { SiteChecklistFields } from "./site-checklist";
import { VentsEditor } from "./vents-editor";

export interface SpaceEditorProps {
  draft: SpaceDraft;
  /**
   * Applies `update` to the current draft of space `spaceId`. The page passes the same callbacks on
   * every render, so this editor and its parts render again only when their own data changes.
   */
  onUpdate: (spaceId: string, update: (draft: SpaceDraft) => SpaceDraft) => void;
  unitSystem: UnitSystem;
  isReadOnly: boolean;
  typicalIds: string[];
  onTypicalChange: (spaceId: string, ids: string[]) => void;
  otherSpaces: { id: string; name: string; ventCount: number }[];
  onCopyFrom: (toSpaceId: string, fromSpaceId: string) => void;
  onDelete: (spaceId: string) => void;
  /** The photos panel, built by the page. */
  photos: ReactNode;
}

/** Everything recorded for one attic space, top to bottom in the order it is surveyed. */
export const SpaceEditor = memo(function SpaceEditor({
  draft,
  onUpdate,
  unitSystem,
  isReadOnly,
  typicalIds,
  onTypicalChange,
  otherSpaces,
  onCopyFrom,
  onDelete,
  photos,
}: SpaceEditorProps) {
  const { id } = draft;
  const edit = (patch: Partial<SpaceDraft>) => onUpdate(id, (d) => ({ ...d, ...patch }));
  const setRoof = useCallback((roof: RoofDraft) => onUpdate(id, (d) => ({ ...d, roof })), [id, onUpdate]);
  const updateSections = useCallback(
    (update: (sections: SectionDraft[]) => SectionDraft[]) => onUpdate(id, (d) => ({ ...d, sections: update(d.sections) })),
    [id, onUpdate],
  );
  const updateVents = useCallback(
    (update: (vents: VentDraft[]) => VentDraft[]) => onUpdate(id, (d) => ({ ...d, vents: update(d.vents) })),
    [id, onUpdate],
  );
  const setSite = useCallback((site: SiteChecklist) => onUpdate(id, (d) => ({ ...d, site })), [id, onUpdate]);
  const setTypical = useCallback((ids: string[]) => onTypicalChange(id, ids), [id, onTypicalChange]);
  const copyFrom = useCallback((fromSpaceId: string) => onCopyFrom(id, fromSpaceId), [id, onCopyFrom]);
  return (
    <div className="space-y-5">
      <Card>
        <CardBody className="flex flex-col gap-3 sm:flex-row sm:items-end">
          <TextField
            label="Space name"
            value={draft.name}
            disabled={isReadOnly}
            error={draft.name.trim() === "" ? "Name the space (e.g. Main attic)." : undefined}
            onChange={(event) => edit({ name: event.target.value })}
            className="flex-1"
          />
          {isReadOnly ? null : (
            <Button variant="ghost" className="text-critical-700 hover:bg-critical-50" onClick={() => onDelete(id)}>
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
            <RoofFields roof={draft.roof} onChange={setRoof} unitSystem={unitSystem} />
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
              onChange={updateSections}
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
              onChange={updateVents}
              unitSystem={unitSystem}
              ridgeLengthFt={draft.roof.ridgeLength.value}
              eaveLengthFt={draft.roof.eaveLength.value}
              typicalIds={typicalIds}
              onTypicalChange={setTypical}
              otherSpaces={otherSpaces}
              onCopyFrom={copyFrom}
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
            <SiteChecklistFields site={draft.site} onChange={setSite} isReadOnly={isReadOnly} />
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
            onChange={(event) => edit({ notes: event.target.value })}
          />
        </CardBody>
      </Card>
    </div>
  );
});
