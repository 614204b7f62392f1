import { isVentCatalogKind, withCatalogLabor } from "@shared/design/index";
import type { CatalogItem } from "@shared/schemas/catalog";
import type { AddedItem, Adjustment, DesignOptionInput, LaborLine, OptionSpace, VentAction } from "@shared/schemas/options";
import { isPoweredKind, type Vent } from "@shared/ventilation/index";
import type { SpaceRecord } from "../api/types";
import { centsToText } from "./money";
import { basisPointsToText, parseCents, parsePercentToBasisPoints, parsePositive, parseWhole } from "./numbers";

/*
 * The editor's own model of an option. Every typed number keeps its text, so a bad entry is shown
 * with its message and never lost; `buildOption` turns the draft into what the server and the
 * shared core accept, leaving out (and naming) whatever is not complete yet.
 */

export interface AddedDraft {
  id: string;
  catalogItemId: string;
  quantity: string;
  location: "" | "upper" | "lower";
  /** Feet below the ridge, for high vents. */
  drop: string;
  replacesVentId?: string;
  note?: string;
}

export interface SpaceDraft {
  spaceId: string;
  ventActions: Record<string, VentAction>;
  added: AddedDraft[];
  siteFixes: OptionSpace["siteFixes"];
}

export interface LaborDraft {
  id: string;
  description: string;
  hours: string;
  rate: string;
  /** Absent for a line typed by hand; "catalog" follows the quantities; "overridden" is the catalog's line with typed hours. */
  hoursBasis?: LaborLine["hoursBasis"];
}

export type DiscountKind = Adjustment["kind"];

export interface OptionDraft {
  name: string;
  notes: string;
  isKept: boolean;
  spaces: SpaceDraft[];
  labor: LaborDraft[];
  discountKind: DiscountKind;
  discountAmount: string;
  discountPercent: string;
}

export interface Problem {
  /** The draft entry it belongs to (an added item's or labour line's id, or "name" / "discount"). */
  key: string;
  message: string;
}

export type OptionPayload = Pick<DesignOptionInput, "name" | "notes" | "spaces" | "laborLines" | "discount" | "isKept">;

export function newId(): string {
  return typeof crypto !== "undefined" && "randomUUID" in crypto ? crypto.randomUUID().slice(0, 12) : Math.random().toString(36).slice(2, 14);
}

const numberText = (n: number | undefined) => (n === undefined ? "" : String(n));

export function draftFromOption(option: OptionPayload, projectSpaces: readonly SpaceRecord[]): OptionDraft {
  const spaces: SpaceDraft[] = projectSpaces.map((space) => {
    const plan = option.spaces.find((s) => s.spaceId === space.id);
    return {
      spaceId: space.id,
      ventActions: { ...(plan?.ventActions ?? {}) },
      siteFixes: { ...(plan?.siteFixes ?? {}) },
      added: (plan?.added ?? []).map((a) => ({
        id: a.id,
        catalogItemId: a.catalogItemId,
        quantity: String(a.quantity),
        location: a.location ?? "",
        drop: numberText(a.dropBelowRidgeFt),
        replacesVentId: a.replacesVentId,
        note: a.note,
      })),
    };
  });
  const d = option.discount;
  return {
    name: option.name,
    notes: option.notes ?? "",
    isKept: option.isKept,
    spaces,
    labor: option.laborLines.map((l) => ({ id: l.id, description: l.description, hours: String(l.hours), rate: centsToText(l.rateCents), ...(l.hoursBasis ? { hoursBasis: l.hoursBasis } : {}) })),
    discountKind: d.kind,
    discountAmount: d.kind === "amount" ? centsToText(d.cents) : "",
    discountPercent: d.kind === "percent" ? basisPointsToText(d.basisPoints) : "",
  };
}

const isEmptySpace = (s: SpaceDraft) =>
  Object.values(s.ventActions).every((a) => a === "keep") && s.added.length === 0 && !s.siteFixes.clearsBlockedSoffits && !s.siteFixes.sealsGableFan;

/** Problems for one added item, by field. */
export function addedProblems(a: AddedDraft, item: CatalogItem | undefined): { quantity?: string; drop?: string; item?: string } {
  const out: { quantity?: string; drop?: string; item?: string } = {};
  if (!item) {
    out.item = "Choose a catalog item.";
    return out;
  }
  const isCounted = isVentCatalogKind(item.kind) && (item.unit === "each" || isPoweredKind(item.kind));
  const q = isCounted ? parseWhole(a.quantity, "Quantity") : parsePositive(a.quantity, "Quantity");
  if (!q.ok) out.quantity = q.message;
  if (a.drop.trim() !== "") {
    const d = parsePositive(a.drop, "Drop below the ridge");
    if (!d.ok && a.drop.trim() !== "0") out.drop = d.message;
  }
  return out;
}

export function laborProblems(l: LaborDraft): { description?: string; hours?: string; rate?: string } {
  const out: { description?: string; hours?: string; rate?: string } = {};
  if (l.description.trim() === "") out.description = "Describe the work.";
  const h = parsePositive(l.hours, "Hours");
  if (!h.ok) out.hours = h.message;
  const r = parseCents(l.rate, "Rate");
  if (!r.ok) out.rate = r.message;
  return out;
}

export function discountProblem(d: OptionDraft): string | null {
  if (d.discountKind === "amount") {
    const r = parseCents(d.discountAmount, "Discount");
    return r.ok ? null : r.message;
  }
  if (d.discountKind === "percent") {
    const r = parsePercentToBasisPoints(d.discountPercent, "Discount");
    return r.ok ? null : r.message;
  }
  return null;
}

/**
 * The draft as the option the API and core accept. Incomplete lines are left out of `option` and
 * listed in `problems`, so the live analysis keeps working while the autosave waits for a fix.
 */
export function buildOption(draft: OptionDraft, catalog: readonly CatalogItem[]): { option: OptionPayload; problems: Problem[] } {
  const byId = new Map(catalog.map((i) => [i.id, i]));
  const problems: Problem[] = [];
  if (draft.name.trim() === "") problems.push({ key: "name", message: "Name the option." });

  const spaces: OptionSpace[] = [];
  for (const s of draft.spaces) {
    if (isEmptySpace(s)) continue;
    const added: AddedItem[] = [];
    for (const a of s.added) {
      const item = byId.get(a.catalogItemId);
      const p = addedProblems(a, item);
      const first = p.item ?? p.quantity ?? p.drop;
      if (first) {
        problems.push({ key: a.id, message: `${item?.name ?? "An added item"}: ${first}` });
        continue;
      }
      const line: AddedItem = { id: a.id, catalogItemId: a.catalogItemId, quantity: Number(a.quantity.trim().replace(/,/g, "")) };
      if (a.location) line.location = a.location;
      if (a.drop.trim() !== "") line.dropBelowRidgeFt = Number(a.drop.trim());
      if (a.replacesVentId) line.replacesVentId = a.replacesVentId;
      if (a.note) line.note = a.note;
      added.push(line);
    }
    const ventActions = Object.fromEntries(Object.entries(s.ventActions).filter(([, action]) => action !== "keep"));
    const siteFixes: OptionSpace["siteFixes"] = {};
    if (s.siteFixes.clearsBlockedSoffits) siteFixes.clearsBlockedSoffits = true;
    if (s.siteFixes.sealsGableFan) siteFixes.sealsGableFan = true;
    spaces.push({ spaceId: s.spaceId, ventActions, added, siteFixes });
  }

  const laborLines: LaborLine[] = [];
  for (const l of draft.labor) {
    const p = laborProblems(l);
    const first = p.description ?? p.hours ?? p.rate;
    if (first) {
      problems.push({ key: l.id, message: `Labour "${l.description.trim() || "unnamed"}": ${first}` });
      continue;
    }
    laborLines.push({
      id: l.id, description: l.description.trim(), hours: Number(l.hours.trim()), rateCents: (parseCents(l.rate, "Rate") as { value: number }).value,
      ...(l.hoursBasis ? { hoursBasis: l.hoursBasis } : {}),
    });
  }

  let discount: Adjustment = { kind: "none" };
  const dp = discountProblem(draft);
  if (dp) problems.push({ key: "discount", message: dp });
  else if (draft.discountKind === "amount") discount = { kind: "amount", cents: (parseCents(draft.discountAmount, "Discount") as { value: number }).value };
  else if (draft.discountKind === "percent") discount = { kind: "percent", basisPoints: (parsePercentToBasisPoints(draft.discountPercent, "Discount") as { value: number }).value };

  return {
    option: withCatalogLabor({ name: draft.name.trim() || "Untitled option", notes: draft.notes.trim() === "" ? null : draft.notes, isKept: draft.isKept, spaces, laborLines, discount }, catalog),
    problems,
  };
}

/** A sensible starting quantity when a vent is replaced: its length or count. */
export function startingQuantity(vent: Vent | undefined): string {
  if (!vent) return "1";
  if (vent.lengthFt !== undefined) return String(vent.lengthFt);
  if (vent.quantity !== undefined) return String(vent.quantity);
  return "1";
}
