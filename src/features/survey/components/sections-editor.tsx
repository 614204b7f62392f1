import { memo, useCallback, useState } from "react";
import type { UnitSystem } from "@shared/units/format";
import { formatAreaSqFt } from "@shared/units/format";
import { sectionAreaSqFt } from "@shared/ventilation/index";
import { Button } from "@/components/ui/button";
import { TextField } from "@/components/ui/field";
import { CloseIcon, PlusIcon } from "@/components/ui/icons";
import { Radio, RadioGroup } from "@/components/ui/checkbox";
import { buildSection, emptySection, newId, sectionName, type PointDraft, type SectionDraft, type SectionKind } from "../lib/drafts";
import { areaEntry, lengthEntry, lengthText } from "../lib/measure";
import { EntryField } from "./entry-field";
import { PolygonGrid } from "./polygon-grid";
import { RemainingProblems } from "./remaining-problems";

type SectionsUpdate = (sections: SectionDraft[]) => SectionDraft[];
type SectionUpdate = (section: SectionDraft) => SectionDraft;

export interface SectionsEditorProps {
  sections: SectionDraft[];
  /** Given a function of the current sections, so the callbacks below stay the same from render to render. */
  onChange: (update: SectionsUpdate) => void;
  unitSystem: UnitSystem;
  isReadOnly: boolean;
}

const KIND_LABELS: Record<SectionKind, { label: string; description: string }> = {
  rect: { label: "Rectangle", description: "Length × width" },
  polygon: { label: "Outline", description: "Corners in order" },
  area: { label: "Area", description: "Already worked out" },
};

export const SectionsEditor = memo(function SectionsEditor({ sections, onChange, unitSystem, isReadOnly }: SectionsEditorProps) {
  // Keyed by id and stable, so typing in one section leaves the other (memoised) cards alone.
  const updateSection = useCallback(
    (sectionId: string, update: SectionUpdate) => onChange((list) => list.map((s) => (s.id === sectionId ? update(s) : s))),
    [onChange],
  );
  const removeSection = useCallback((sectionId: string) => onChange((list) => list.filter((s) => s.id !== sectionId)), [onChange]);
  const add = (kind: SectionKind) => {
    const section = emptySection(kind);
    onChange((list) => [...list, section]);
  };
  return (
    <div className="space-y-4">
      {sections.length === 0 ? (
        <p className="text-base text-ink-700">
          Measure the attic floor in sections: a rectangle for each block of the house, an outline for odd shapes, or an area you
          already know.
        </p>
      ) : null}
      {sections.map((section, index) => (
        <SectionCard
          key={section.id}
          index={index}
          section={section}
          unitSystem={unitSystem}
          isReadOnly={isReadOnly}
          onUpdate={updateSection}
          onRemove={removeSection}
        />
      ))}
      {isReadOnly ? null : (
        <div className="flex flex-wrap gap-2">
          <Button variant="secondary" icon={<PlusIcon />} onClick={() => add("rect")}>
            Add rectangle
          </Button>
          <Button variant="ghost" icon={<PlusIcon />} onClick={() => add("polygon")}>
            Add outline
          </Button>
          <Button variant="ghost" icon={<PlusIcon />} onClick={() => add("area")}>
            Add area
          </Button>
        </div>
      )}
    </div>
  );
});

const SectionCard = memo(function SectionCard({
  index,
  section,
  onUpdate,
  onRemove,
  unitSystem,
  isReadOnly,
}: {
  index: number;
  section: SectionDraft;
  onUpdate: (sectionId: string, update: SectionUpdate) => void;
  onRemove: (sectionId: string) => void;
  unitSystem: UnitSystem;
  isReadOnly: boolean;
}) {
  const [isGridOpen, setIsGridOpen] = useState(false);
  const update = (next: SectionUpdate) => onUpdate(section.id, next);
  const edit = (patch: Partial<SectionDraft>) => update((s) => ({ ...s, ...patch }));
  const built = buildSection(section);
  const hasTyped = Boolean(section.length.text || section.width.text || section.area.text || section.points.length > 0);
  // Messages already shown under their own field aren't repeated in the list below.
  const fieldErrors = [section.length, section.width, section.area, ...section.points.flatMap((p) => [p.x, p.y])].flatMap((e) => (e.error ? [e.error] : []));
  const area = built.section ? sectionAreaSqFt(built.section) : null;
  const name = sectionName(section, index);
  const setPoint = (i: number, axis: "x" | "y", text: string) => {
    const entry = lengthEntry(text, { allowZero: true, system: unitSystem });
    update((s) => ({ ...s, points: s.points.map((p, k) => (k === i ? { ...p, [axis]: entry } : p)) }));
  };
  const appendPoint = (point: PointDraft) => update((s) => ({ ...s, points: [...s.points, point] }));
  const addPoint = (point?: [number, number]) =>
    appendPoint({
      key: newId(),
      x: point ? lengthEntry(lengthText(point[0], unitSystem), { allowZero: true, system: unitSystem }) : lengthEntry(""),
      y: point ? lengthEntry(lengthText(point[1], unitSystem), { allowZero: true, system: unitSystem }) : lengthEntry(""),
    });
  // Grid taps are exact feet; keep the exact value even when shown in metres.
  const addGridPoint = (point: [number, number]) => {
    const mk = (v: number) => ({ ...lengthEntry(lengthText(v, unitSystem), { allowZero: true, system: unitSystem }), value: v });
    appendPoint({ key: newId(), x: mk(point[0]), y: mk(point[1]) });
  };
  const gridPoints = section.points.flatMap((p) => (p.x.value !== null && p.y.value !== null ? [[p.x.value, p.y.value] as [number, number]] : []));

  return (
    <fieldset
      id={`part-${section.id}`}
      className="space-y-4 rounded-lg border border-ink-200 bg-white p-4"
      disabled={isReadOnly}
    >
      <div className="flex items-start justify-between gap-3">
        <legend className="float-left text-base font-semibold text-ink-900">
          {name}
          {area !== null ? <span className="ml-2 font-normal text-ink-600">{formatAreaSqFt(area, unitSystem)}</span> : null}
        </legend>
        {isReadOnly ? null : (
          <Button variant="ghost" size="icon" aria-label={`Remove ${name}`} onClick={() => onRemove(section.id)} className="-mt-2 -mr-2 shrink-0">
            <CloseIcon />
          </Button>
        )}
      </div>
      <div className="clear-both" />
      <RadioGroup legend="Measured as" isInline>
        {(Object.keys(KIND_LABELS) as SectionKind[]).map((kind) => (
          <Radio
            key={kind}
            name={`kind-${section.id}`}
            label={KIND_LABELS[kind].label}
            description={KIND_LABELS[kind].description}
            checked={section.kind === kind}
            onChange={() => edit({ kind })}
          />
        ))}
      </RadioGroup>
      <TextField
        label="Name"
        isOptional
        placeholder="e.g. Main block, Garage wing"
        value={section.label}
        onChange={(event) => edit({ label: event.target.value })}
      />
      {section.kind === "rect" ? (
        <div className="grid gap-4 sm:grid-cols-2">
          <EntryField
            label="Length (along the ridge)"
            placeholder={`40' or 12.2 m`}
            entry={section.length}
            onText={(text) => edit({ length: lengthEntry(text, { system: unitSystem }) })}
          />
          <EntryField
            label="Width (eave to eave)"
            placeholder={`28' 6"`}
            entry={section.width}
            onText={(text) => edit({ width: lengthEntry(text, { system: unitSystem }) })}
          />
        </div>
      ) : section.kind === "area" ? (
        <EntryField
          label="Floor area"
          hint="An area in sq ft or m², or sides to multiply, such as 12 x 20 or 30 x 40 + 12 x 20."
          placeholder="12 x 20"
          entry={section.area}
          onText={(text) => edit({ area: areaEntry(text, unitSystem) })}
        />
      ) : (
        <div className="space-y-3">
          <p className="text-sm text-ink-700">
            Corners measured from one starting corner: how far across, and how far down the plan. Go around the outline in order.
          </p>
          <ol className="space-y-3">
            {section.points.map((point, i) => (
              <li key={point.key} className="grid grid-cols-[minmax(0,1fr)_minmax(0,1fr)_auto] items-start gap-2">
                <EntryField
                  label={`Corner ${i + 1} across`}
                  entry={point.x}
                  onText={(text) => setPoint(i, "x", text)}
                  placeholder="0"
                />
                <EntryField label={`Corner ${i + 1} down`} entry={point.y} onText={(text) => setPoint(i, "y", text)} placeholder="0" />
                <Button
                  variant="ghost"
                  size="icon"
                  aria-label={`Remove corner ${i + 1}`}
                  className="mt-7"
                  onClick={() => update((s) => ({ ...s, points: s.points.filter((_, k) => k !== i) }))}
                >
                  <CloseIcon />
                </Button>
              </li>
            ))}
          </ol>
          <div className="flex flex-wrap gap-2">
            <Button variant="secondary" size="sm" icon={<PlusIcon />} onClick={() => addPoint()}>
              Add corner
            </Button>
            <Button variant="ghost" size="sm" aria-expanded={isGridOpen} onClick={() => setIsGridOpen((v) => !v)}>
              {isGridOpen ? "Hide the grid" : "Tap corners on a grid"}
            </Button>
          </div>
          {isGridOpen ? <PolygonGrid points={gridPoints} onAdd={addGridPoint} unitSystem={unitSystem} /> : null}
        </div>
      )}
      {hasTyped ? <RemainingProblems problems={built.problems} fieldErrors={fieldErrors} /> : null}
    </fieldset>
  );
});
