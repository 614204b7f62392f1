import type { SiteChecklist, SpaceRoof, SpaceSurvey } from "@shared/schemas/survey";
import { SpaceSurveySchema } from "@shared/schemas/survey";
import type { UnitSystem } from "@shared/units/format";
import {
  isPoweredKind,
  SectionSchema,
  VENT_KIND_LABELS,
  VentSchema,
  type Section,
  type Vent,
  type VentKind,
} from "@shared/ventilation/index";
import type { FanDiagnostics } from "@shared/diagnostics/index";
import type { SpaceRecord } from "../api/types";
import {
  emptyEntry,
  entryFromArea,
  entryFromInches,
  entryFromLength,
  entryFromNumber,
  type EntryDraft,
} from "./measure";

/*
 * The editor's own model of an attic space. Every typed field keeps its text as typed next to the
 * value understood from it, so a bad entry is shown with its message and never lost. `buildSurvey`
 * turns it into what the server and the core accept, leaving out (and explaining) whatever is not
 * complete yet.
 */

export type SectionKind = "rect" | "polygon" | "area";

export interface PointDraft {
  key: string;
  x: EntryDraft;
  y: EntryDraft;
}

export interface SectionDraft {
  id: string;
  kind: SectionKind;
  label: string;
  length: EntryDraft;
  width: EntryDraft;
  area: EntryDraft;
  points: PointDraft[];
}

export type SizeMode = "linear" | "per-unit" | "gross" | "powered";

export type FanControl = NonNullable<Vent["control"]>;

export interface DiagnosticsDraft {
  isPowerVerifiedOff: boolean;
  blade: "" | "free" | "stuck";
  atticTemp: EntryDraft;
  voltsBelow: EntryDraft;
  voltsAbove: EntryDraft;
  /** A number of ohms, or "open" / "OL". */
  winding: EntryDraft & { isOpen: boolean };
}

export interface VentDraft {
  id: string;
  kind: VentKind;
  location: "upper" | "lower";
  label: string;
  quantity: EntryDraft;
  nfaPerUnit: EntryDraft;
  length: EntryDraft;
  nfaPerFt: EntryDraft;
  grossWidth: EntryDraft;
  grossHeight: EntryDraft;
  mesh: "1/4" | "1/8" | "1/16";
  louvers: boolean;
  cfm: EntryDraft;
  mounting: "" | "roof" | "gable";
  setPoint: EntryDraft;
  control: "" | FanControl;
  sealedToOpening: "" | "yes" | "no";
  drop: EntryDraft;
  diagnostics: DiagnosticsDraft;
}

export interface RoofDraft {
  form: SpaceRoof["form"];
  pitch: EntryDraft;
  ridgeLength: EntryDraft;
  eaveLength: EntryDraft;
}

export interface SpaceDraft {
  id: string;
  name: string;
  roof: RoofDraft;
  sections: SectionDraft[];
  vents: VentDraft[];
  site: SiteChecklist;
  notes: string;
}

export const SIZE_MODE: Record<VentKind, SizeMode> = {
  ridge: "linear",
  "soffit-continuous": "linear",
  "drip-edge": "linear",
  fascia: "linear",
  "soffit-individual": "per-unit",
  box: "per-unit",
  turbine: "per-unit",
  "off-ridge": "per-unit",
  cupola: "per-unit",
  "gable-louver": "gross",
  "powered-roof": "powered",
  "powered-gable": "powered",
  "solar-powered": "powered",
};

export const DEFAULT_LOCATION: Record<VentKind, "upper" | "lower"> = {
  ridge: "upper",
  "soffit-continuous": "lower",
  "drip-edge": "lower",
  fascia: "lower",
  "soffit-individual": "lower",
  box: "upper",
  turbine: "upper",
  "off-ridge": "upper",
  cupola: "upper",
  "gable-louver": "upper",
  "powered-roof": "upper",
  "powered-gable": "upper",
  "solar-powered": "upper",
};

export const newId = (): string =>
  typeof crypto !== "undefined" && "randomUUID" in crypto
    ? crypto.randomUUID()
    : `id-${Date.now().toString(36)}-${Math.random().toString(36).slice(2, 10)}`;

export function emptyDiagnostics(): DiagnosticsDraft {
  return {
    isPowerVerifiedOff: false,
    blade: "",
    atticTemp: emptyEntry(),
    voltsBelow: emptyEntry(),
    voltsAbove: emptyEntry(),
    winding: { ...emptyEntry(), isOpen: false },
  };
}

export function emptySection(kind: SectionKind = "rect"): SectionDraft {
  return { id: newId(), kind, label: "", length: emptyEntry(), width: emptyEntry(), area: emptyEntry(), points: [] };
}

export function emptyVent(kind: VentKind): VentDraft {
  return {
    id: newId(),
    kind,
    location: DEFAULT_LOCATION[kind],
    label: "",
    quantity: emptyEntry(),
    nfaPerUnit: emptyEntry(),
    length: emptyEntry(),
    nfaPerFt: emptyEntry(),
    grossWidth: emptyEntry(),
    grossHeight: emptyEntry(),
    mesh: "1/8",
    louvers: true,
    cfm: emptyEntry(),
    mounting: kind === "powered-gable" ? "gable" : kind === "powered-roof" || kind === "solar-powered" ? "roof" : "",
    setPoint: emptyEntry(),
    control: kind === "solar-powered" ? "solar" : "",
    sealedToOpening: "",
    drop: emptyEntry(),
    diagnostics: emptyDiagnostics(),
  };
}

function diagnosticsFromServer(d: FanDiagnostics | undefined): DiagnosticsDraft {
  const base = emptyDiagnostics();
  if (!d) return base;
  return {
    isPowerVerifiedOff: d.isPowerVerifiedOff === true,
    blade: d.isBladeFreeToSpin === undefined ? "" : d.isBladeFreeToSpin ? "free" : "stuck",
    atticTemp: entryFromNumber(d.thermostatTest?.atticTempF),
    voltsBelow: entryFromNumber(d.thermostatTest?.switchedLegVoltsDialBelow),
    voltsAbove: entryFromNumber(d.thermostatTest?.switchedLegVoltsDialAbove),
    winding:
      d.windingResistanceOhms === "open"
        ? { text: "open", value: null, error: null, understood: "Open circuit (no continuity)", isOpen: true }
        : { ...entryFromNumber(d.windingResistanceOhms), isOpen: false },
  };
}

export function sectionFromServer(section: Section, system: UnitSystem): SectionDraft {
  const draft = emptySection(section.kind);
  draft.id = section.id ?? newId();
  draft.label = section.label ?? "";
  if (section.kind === "rect") {
    draft.length = entryFromLength(section.lengthFt, system);
    draft.width = entryFromLength(section.widthFt, system);
  } else if (section.kind === "area") {
    draft.area = entryFromArea(section.areaSqFt, system);
  } else {
    draft.points = section.pointsFt.map(([x, y]) => ({
      key: newId(),
      x: entryFromLength(x, system, { allowZero: true }),
      y: entryFromLength(y, system, { allowZero: true }),
    }));
  }
  return draft;
}

export function ventFromServer(vent: Vent, system: UnitSystem): VentDraft {
  const draft = emptyVent(vent.kind);
  return {
    ...draft,
    id: vent.id,
    location: vent.location,
    label: vent.label ?? "",
    quantity: entryFromNumber(vent.quantity),
    nfaPerUnit: entryFromNumber(vent.nfaSqInPerUnit ?? vent.nfaSqIn),
    length: entryFromLength(vent.lengthFt, system),
    nfaPerFt: entryFromNumber(vent.nfaSqInPerFt),
    grossWidth: entryFromInches(vent.grossWidthIn),
    grossHeight: entryFromInches(vent.grossHeightIn),
    mesh: vent.covering?.mesh ?? "1/8",
    louvers: vent.covering?.louvers ?? true,
    cfm: entryFromNumber(vent.cfm),
    mounting: vent.mounting ?? draft.mounting,
    setPoint: entryFromNumber(vent.thermostatSetPointF),
    control: vent.control ?? "",
    sealedToOpening: vent.sealedToOpening === undefined ? "" : vent.sealedToOpening ? "yes" : "no",
    drop: entryFromLength(vent.dropBelowRidgeFt, system, { allowZero: true }),
    diagnostics: diagnosticsFromServer(vent.diagnostics),
  };
}

export function spaceFromServer(space: Pick<SpaceRecord, "id" | "name" | "roof" | "sections" | "vents" | "site" | "notes">, system: UnitSystem): SpaceDraft {
  return {
    id: space.id,
    name: space.name,
    roof: {
      form: space.roof.form,
      pitch: entryFromNumber(space.roof.pitchIn12),
      ridgeLength: entryFromLength(space.roof.ridgeLengthFt, system),
      eaveLength: entryFromLength(space.roof.eaveLengthFt, system),
    },
    sections: space.sections.map((s) => sectionFromServer(s, system)),
    vents: space.vents.map((v) => ventFromServer(v, system)),
    site: { ...space.site },
    notes: space.notes ?? "",
  };
}

/** Something not complete or not readable, kept on this device until it is fixed. */
export interface Problem {
  /** "Section 2", "Vent 3 (ridge vent)", "Roof". */
  where: string;
  message: string;
  /** The part it belongs to, to jump to it. */
  partId?: string;
}

export const ventName = (vent: Pick<VentDraft, "kind" | "label">, index: number) =>
  `Vent ${index + 1} (${vent.label.trim() || VENT_KIND_LABELS[vent.kind]})`;
export const sectionName = (section: Pick<SectionDraft, "label">, index: number) =>
  `Section ${index + 1}${section.label.trim() ? ` (${section.label.trim()})` : ""}`;

/** Checks one entry: a parse error, or a missing value when `label` says it is required. */
function need(entry: EntryDraft, label: string, problems: string[], isRequired = true): number | undefined {
  if (entry.error) {
    problems.push(`${label}: ${entry.error}`);
    return undefined;
  }
  if (entry.value === null) {
    if (isRequired) problems.push(`Enter the ${lowerFirstWord(label)}.`);
    return undefined;
  }
  return entry.value;
}

/** "Length" → "length", but "NFA per foot" stays "NFA per foot": abbreviations keep their capitals. */
const lowerFirstWord = (label: string) => label.replace(/^[A-Z][a-z]+\b/, (word) => word.toLowerCase());

function zodMessages(issues: { path: PropertyKey[]; message: string }[]): string[] {
  return issues.map((i) => i.message);
}

/*
 * Drafts are replaced, never changed in place, so each part's check is kept beside the part: a
 * keystroke in one section checks that section again and reuses the others' results, in the live
 * analysis and in the save alike. The results are shared, so callers only read them.
 */
const builtSections = new WeakMap<SectionDraft, { section: Section | null; problems: string[] }>();
const builtVents = new WeakMap<VentDraft, { vent: Vent | null; problems: string[] }>();

export function buildSection(draft: SectionDraft): { section: Section | null; problems: string[] } {
  let built = builtSections.get(draft);
  if (!built) {
    built = checkSection(draft);
    builtSections.set(draft, built);
  }
  return built;
}

export function buildVent(draft: VentDraft): { vent: Vent | null; problems: string[] } {
  let built = builtVents.get(draft);
  if (!built) {
    built = checkVent(draft);
    builtVents.set(draft, built);
  }
  return built;
}

function checkSection(draft: SectionDraft): { section: Section | null; problems: string[] } {
  const problems: string[] = [];
  const base = { id: draft.id, ...(draft.label.trim() ? { label: draft.label.trim() } : {}) };
  let candidate: unknown;
  if (draft.kind === "rect") {
    const lengthFt = need(draft.length, "Length", problems);
    const widthFt = need(draft.width, "Width", problems);
    candidate = { kind: "rect", lengthFt, widthFt, ...base };
  } else if (draft.kind === "area") {
    const areaSqFt = need(draft.area, "Area", problems);
    candidate = { kind: "area", areaSqFt, ...base };
  } else {
    const pointsFt: [number, number][] = [];
    draft.points.forEach((p, i) => {
      const x = need(p.x, `Corner ${i + 1} across`, problems);
      const y = need(p.y, `Corner ${i + 1} down`, problems);
      if (x !== undefined && y !== undefined) pointsFt.push([x, y]);
    });
    if (draft.points.length < 3) problems.push("An outline needs at least 3 corners.");
    candidate = { kind: "polygon", pointsFt, ...base };
  }
  if (problems.length > 0) return { section: null, problems };
  const parsed = SectionSchema.safeParse(candidate);
  if (!parsed.success) return { section: null, problems: zodMessages(parsed.error.issues) };
  return { section: parsed.data, problems: [] };
}

function checkVent(draft: VentDraft): { vent: Vent | null; problems: string[] } {
  const problems: string[] = [];
  const mode = SIZE_MODE[draft.kind];
  const vent: Record<string, unknown> = { id: draft.id, kind: draft.kind, location: draft.location };
  if (draft.label.trim()) vent.label = draft.label.trim();
  const drop = need(draft.drop, "Drop below the ridge", problems, false);
  if (drop !== undefined) vent.dropBelowRidgeFt = drop;
  if (mode === "linear") {
    vent.lengthFt = need(draft.length, "Length", problems);
    vent.nfaSqInPerFt = need(draft.nfaPerFt, "NFA per foot", problems);
  } else if (mode === "per-unit") {
    vent.quantity = need(draft.quantity, "Count", problems);
    vent.nfaSqInPerUnit = need(draft.nfaPerUnit, "NFA of each", problems);
  } else if (mode === "gross") {
    vent.grossWidthIn = need(draft.grossWidth, "Gross width", problems);
    vent.grossHeightIn = need(draft.grossHeight, "Gross height", problems);
    vent.covering = { mesh: draft.mesh, louvers: draft.louvers };
  } else {
    vent.cfm = need(draft.cfm, "Rated airflow (cfm)", problems);
    const quantity = need(draft.quantity, "Count", problems, false);
    if (quantity !== undefined) vent.quantity = quantity;
    if (draft.mounting) vent.mounting = draft.mounting;
    const setPoint = need(draft.setPoint, "Thermostat set point", problems, false);
    if (setPoint !== undefined) vent.thermostatSetPointF = setPoint;
    if (draft.control) {
      vent.control = draft.control;
      vent.hasThermostat = draft.control === "thermostat" || draft.control === "thermostat-and-humidistat";
    }
    if (draft.sealedToOpening) vent.sealedToOpening = draft.sealedToOpening === "yes";
    const d = draft.diagnostics;
    const diagnostics: FanDiagnostics = {};
    if (d.isPowerVerifiedOff) diagnostics.isPowerVerifiedOff = true;
    if (d.isPowerVerifiedOff) {
      if (d.blade) diagnostics.isBladeFreeToSpin = d.blade === "free";
      if (d.winding.isOpen) diagnostics.windingResistanceOhms = "open";
      else {
        const ohms = need(d.winding, "Winding resistance", problems, false);
        if (ohms !== undefined) diagnostics.windingResistanceOhms = ohms;
      }
      const below = need(d.voltsBelow, "Volts with the dial below", problems, false);
      const above = need(d.voltsAbove, "Volts with the dial above", problems, false);
      const attic = need(d.atticTemp, "Attic temperature", problems, false);
      if (below !== undefined && above !== undefined) {
        diagnostics.thermostatTest = {
          switchedLegVoltsDialBelow: below,
          switchedLegVoltsDialAbove: above,
          ...(attic !== undefined ? { atticTempF: attic } : {}),
        };
      } else if (below !== undefined || above !== undefined) {
        problems.push("Thermostat test: enter both readings, with the dial below and above the attic temperature.");
      }
    }
    if (Object.keys(diagnostics).length > 0) vent.diagnostics = diagnostics;
  }
  if (!isPoweredKind(draft.kind)) delete vent.diagnostics;
  if (problems.length > 0) return { vent: null, problems };
  const parsed = VentSchema.safeParse(vent);
  if (!parsed.success) return { vent: null, problems: zodMessages(parsed.error.issues) };
  return { vent: parsed.data, problems: [] };
}

export function buildRoof(draft: RoofDraft): { roof: SpaceRoof; problems: Problem[] } {
  const problems: string[] = [];
  const pitch = need(draft.pitch, "Pitch", problems, false);
  const ridge = need(draft.ridgeLength, "Ridge length", problems, false);
  const eave = need(draft.eaveLength, "Eave length", problems, false);
  return {
    roof: { form: draft.form, pitchIn12: pitch ?? 6, ridgeLengthFt: ridge ?? null, eaveLengthFt: eave ?? null },
    problems: problems.map((message) => ({ where: "Roof", message })),
  };
}

export interface BuiltSpace {
  /** What can be sent now: complete parts, plus the last saved copy of a part being fixed. Null when nothing can be sent. */
  survey: SpaceSurvey | null;
  /** Why the whole space can't be sent, when `survey` is null. */
  blockedReason: string | null;
  problems: Problem[];
}

/**
 * The survey to send: complete sections and vents as they are now; a part being corrected keeps
 * its last saved copy on the server (from `lastSaved`) instead of vanishing there.
 */
export function buildSpace(draft: SpaceDraft, lastSaved?: { sections: Section[]; vents: Vent[]; roof: SpaceRoof }): BuiltSpace {
  const problems: Problem[] = [];
  const { roof, problems: roofProblems } = buildRoof(draft.roof);
  problems.push(...roofProblems);
  const savedRoof = roofProblems.length > 0 && lastSaved ? lastSaved.roof : roof;
  const sections: Section[] = [];
  draft.sections.forEach((s, i) => {
    const built = buildSection(s);
    if (built.section) sections.push(built.section);
    else {
      const previous = lastSaved?.sections.find((p) => p.id === s.id);
      if (previous) sections.push(previous);
      for (const message of built.problems) problems.push({ where: sectionName(s, i), message, partId: s.id });
    }
  });
  const vents: Vent[] = [];
  draft.vents.forEach((v, i) => {
    const built = buildVent(v);
    if (built.vent) vents.push(built.vent);
    else {
      const previous = lastSaved?.vents.find((p) => p.id === v.id);
      if (previous) vents.push(previous);
      for (const message of built.problems) problems.push({ where: ventName(v, i), message, partId: v.id });
    }
  });
  const candidate = {
    name: draft.name,
    roof: savedRoof,
    sections,
    vents,
    site: draft.site,
    notes: draft.notes.trim() === "" ? null : draft.notes,
  };
  const parsed = SpaceSurveySchema.safeParse(candidate);
  if (!parsed.success) {
    const first = parsed.error.issues[0];
    const message = first?.path[0] === "name" ? first.message : (first?.message ?? "This space can't be saved yet.");
    problems.unshift({ where: "Space", message });
    return { survey: null, blockedReason: message, problems };
  }
  return { survey: parsed.data, blockedReason: null, problems };
}

/** Same survey with only complete parts (for the live analysis: no stale copies). */
export function liveSurvey(draft: SpaceDraft): SpaceSurvey {
  const { roof } = buildRoof(draft.roof);
  return {
    name: draft.name || "Attic",
    roof,
    sections: draft.sections.flatMap((s) => buildSection(s).section ?? []),
    vents: draft.vents.flatMap((v) => buildVent(v).vent ?? []),
    site: draft.site,
    notes: null,
  };
}

/** A copy of another space's vents for this one: new ids, no section link, no readings of the other fan. */
export function copyVents(vents: VentDraft[]): VentDraft[] {
  return vents.map((v) => ({ ...structuredClone(v), id: newId(), diagnostics: emptyDiagnostics() }));
}

export { fingerprint } from "@/lib/use-autosave";
