/**
 * Two versions of one attic space (the edits on this device and a newer one saved elsewhere),
 * compared part by part so the estimator keeps either side of each: the name, each roof entry,
 * each checklist answer, each section and each vent (matched by id), the notes. Nothing is
 * merged without being shown: every part that differs is listed, and parts only one side has
 * (added there, or removed on the other) are listed too.
 */
import type { SpaceRoof, SpaceSurvey } from "@shared/schemas/survey";
import { formatAreaSqFt, formatLength, formatNfaSqIn, type UnitSystem } from "@shared/units/format";
import { VENT_KIND_LABELS, type Section, type Vent } from "@shared/ventilation/index";
import type { SpaceRecord } from "../api/types";
import { buildRoof, buildSection, buildVent, spaceFromServer, type RoofDraft, type SpaceDraft } from "./drafts";

export type Side = "mine" | "theirs";

export interface SpaceDifference {
  /** "name", "roof:pitch", "site:soffitsBlocked", "section:<id>", "vent:<id>", "notes". */
  key: string;
  /** What the part is, in words: "Roof pitch", "Vent: ridge vent". */
  label: string;
  mine: string;
  theirs: string;
}

const ROOF_PARTS: { key: string; label: string; surveyKeys: (keyof SpaceRoof)[]; draftKeys: (keyof RoofDraft)[] }[] = [
  { key: "form", label: "Roof form", surveyKeys: ["form"], draftKeys: ["form"] },
  { key: "pitch", label: "Roof pitch", surveyKeys: ["pitchIn12"], draftKeys: ["pitch"] },
  { key: "ridge", label: "Ridge length", surveyKeys: ["ridgeLengthFt"], draftKeys: ["ridgeLength"] },
  { key: "eave", label: "Eave length", surveyKeys: ["eaveLengthFt"], draftKeys: ["eaveLength"] },
  {
    key: "assembly", label: "Vented or sealed roof", surveyKeys: ["assembly", "unvented"],
    draftKeys: ["assembly", "insulation", "foamR", "foamIsClassII", "insideEnvelope", "roofCovering", "shakeGap"],
  },
  { key: "bays", label: "Enclosed rafter bays", surveyKeys: ["enclosedRafterBays"], draftKeys: ["bayCount", "baySpacing"] },
];

const NOT_THERE = "Not in this version";
const UNFINISHED = "Being entered on this device (not complete yet)";

const same = (a: unknown, b: unknown) => JSON.stringify(a) === JSON.stringify(b);
const pick = <T extends object>(value: T, keys: (keyof T)[]) => Object.fromEntries(keys.map((k) => [k, value[k]]));
const words = (key: string) => key.replace(/([A-Z])/g, " $1").toLowerCase().replace(/^./, (c) => c.toUpperCase());

function describeValue(value: unknown): string {
  if (value === undefined || value === null || value === "") return "Not recorded";
  if (typeof value === "boolean") return value ? "Yes" : "No";
  if (typeof value === "object") {
    return Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined && v !== null)
      .map(([k, v]) => `${words(k)}: ${describeValue(v)}`)
      .join("; ") || "Not recorded";
  }
  return String(value);
}

export function describeSection(section: Section, system: UnitSystem): string {
  const name = section.label ? `${section.label}: ` : "";
  if (section.kind === "rect") return `${name}${formatLength(section.lengthFt, system)} × ${formatLength(section.widthFt, system)}`;
  if (section.kind === "area") return `${name}${formatAreaSqFt(section.areaSqFt, system)}`;
  return `${name}outline with ${section.pointsFt.length} corners`;
}

export function describeVent(vent: Vent, system: UnitSystem): string {
  const kind = VENT_KIND_LABELS[vent.kind];
  const size =
    vent.cfm !== undefined ? `${vent.cfm} cfm`
    : vent.lengthFt !== undefined ? `${formatLength(vent.lengthFt, system)}${vent.nfaSqInPerFt !== undefined ? ` at ${formatNfaSqIn(vent.nfaSqInPerFt, system)}/ft` : ""}`
    : vent.quantity !== undefined ? `${vent.quantity} × ${formatNfaSqIn(vent.nfaSqInPerUnit ?? vent.nfaSqIn ?? 0, system)}`
    : vent.grossWidthIn !== undefined ? `${vent.grossWidthIn} × ${vent.grossHeightIn ?? "?"} in opening`
    : "";
  const text = [vent.label ? `"${vent.label}"` : "", kind, size ? `, ${size}` : "", `, ${vent.location === "upper" ? "high" : "low"}`].join(" ").replace(/ ,/g, ",").trim();
  return text.charAt(0).toUpperCase() + text.slice(1);
}

function describeRoofPart(key: string, value: Record<string, unknown>, system: UnitSystem): string {
  const only = Object.values(value)[0];
  if (key === "pitch" && typeof only === "number") return `${only} in 12`;
  if ((key === "ridge" || key === "eave") && typeof only === "number") return formatLength(only, system);
  return describeValue(Object.keys(value).length === 1 ? only : value);
}

type Part<T> = { id: string; built: T | null };

/** Parts of both lists by id, this device's order first, then those only the other version has. */
function pairs<T>(mine: Part<T>[], theirs: Part<T>[]) {
  const ids = [...new Set([...mine.map((p) => p.id), ...theirs.map((p) => p.id)])];
  return ids.map((id) => ({ id, mine: mine.find((p) => p.id === id), theirs: theirs.find((p) => p.id === id) }));
}

const draftSections = (draft: SpaceDraft) => draft.sections.map((s) => ({ id: s.id, built: buildSection(s).section }));
const draftVents = (draft: SpaceDraft) => draft.vents.map((v) => ({ id: v.id, built: buildVent(v).vent }));

/** The saved version read the way this device reads its own (so equal parts compare equal); sections saved without an id are matched by position. */
function asDraft(record: SpaceRecord, system: UnitSystem): SpaceDraft {
  const draft = spaceFromServer(record, system);
  return { ...draft, sections: draft.sections.map((s, i) => ({ ...s, id: record.sections[i]?.id ?? `#${i}` })) };
}

/** Every part in which the edits on this device and the saved version differ. */
export function spaceDifferences(mine: SpaceDraft, theirs: SpaceRecord, system: UnitSystem): SpaceDifference[] {
  const out: SpaceDifference[] = [];
  const other = asDraft(theirs, system);
  if (mine.name.trim() !== theirs.name) out.push({ key: "name", label: "Space name", mine: mine.name, theirs: theirs.name });

  const myRoof = buildRoof(mine.roof).roof;
  for (const part of ROOF_PARTS) {
    const a = pick(myRoof, part.surveyKeys);
    const b = pick(buildRoof(other.roof).roof, part.surveyKeys);
    if (!same(a, b)) out.push({ key: `roof:${part.key}`, label: part.label, mine: describeRoofPart(part.key, a, system), theirs: describeRoofPart(part.key, b, system) });
  }

  const siteKeys = [...new Set([...Object.keys(mine.site), ...Object.keys(theirs.site)])] as (keyof SpaceDraft["site"])[];
  for (const key of siteKeys) {
    if (!same(mine.site[key], theirs.site[key])) {
      out.push({ key: `site:${key}`, label: `Checklist: ${words(key).toLowerCase()}`, mine: describeValue(mine.site[key]), theirs: describeValue(theirs.site[key]) });
    }
  }

  const listed = <T>(kind: "section" | "vent", label: string, list: ReturnType<typeof pairs<T>>, describe: (item: T) => string) => {
    list.forEach(({ id, mine: m, theirs: t }, i) => {
      if (m && t && m.built && same(m.built, t.built)) return;
      out.push({
        key: `${kind}:${id}`,
        label: `${label} ${i + 1}`,
        mine: m ? (m.built ? describe(m.built) : UNFINISHED) : NOT_THERE,
        theirs: t?.built ? describe(t.built) : NOT_THERE,
      });
    });
  };
  listed("section", "Section", pairs(draftSections(mine), draftSections(other)), (s) => describeSection(s, system));
  listed("vent", "Vent", pairs(draftVents(mine), draftVents(other)), (v) => describeVent(v, system));

  const myNotes = mine.notes.trim() === "" ? null : mine.notes;
  if (myNotes !== theirs.notes) out.push({ key: "notes", label: "Notes", mine: myNotes ?? "No notes", theirs: theirs.notes ?? "No notes" });
  return out;
}

/**
 * The draft made of the chosen side of each differing part (this device's side where no choice
 * was made); parts that do not differ stay as typed here.
 */
export function mergeSpace(mine: SpaceDraft, theirs: SpaceRecord, choices: Record<string, Side>, system: UnitSystem): SpaceDraft {
  const other = asDraft(theirs, system);
  const differing = new Set(spaceDifferences(mine, theirs, system).map((d) => d.key));
  const takeTheirs = (key: string) => differing.has(key) && choices[key] === "theirs";

  const roof = { ...mine.roof };
  for (const part of ROOF_PARTS) {
    if (takeTheirs(`roof:${part.key}`)) for (const key of part.draftKeys) Object.assign(roof, { [key]: other.roof[key] });
  }
  const site = { ...mine.site };
  for (const key of new Set([...Object.keys(mine.site), ...Object.keys(theirs.site)]) as Set<keyof typeof site>) {
    if (!takeTheirs(`site:${key}`)) continue;
    if (theirs.site[key] === undefined) delete site[key];
    else Object.assign(site, { [key]: theirs.site[key] });
  }

  const chooseList = <T extends { id: string }>(kind: "section" | "vent", mineList: T[], theirList: T[], theirIds: string[]) => {
    const ids = [...new Set([...mineList.map((x) => x.id), ...theirIds])];
    return ids.flatMap((id) => {
      const key = `${kind}:${id}`;
      const source = takeTheirs(key) ? theirList : differing.has(key) || mineList.some((x) => x.id === id) ? mineList : theirList;
      return source.filter((x) => x.id === id);
    });
  };
  return {
    ...mine,
    name: takeTheirs("name") ? theirs.name : mine.name,
    notes: takeTheirs("notes") ? (theirs.notes ?? "") : mine.notes,
    roof,
    site,
    sections: chooseList("section", mine.sections, other.sections, other.sections.map((x) => x.id)),
    vents: chooseList("vent", mine.vents, other.vents, other.vents.map((x) => x.id)),
  };
}

/** The survey fields of a saved space, as the save sends them (for comparing). */
export const surveyOf = (record: SpaceRecord): SpaceSurvey => ({
  name: record.name, roof: record.roof, sections: record.sections, vents: record.vents, site: record.site, notes: record.notes,
});
