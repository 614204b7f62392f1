/**
 * Where each passive vent sits, as far as the survey tells: its drop below the ridge, its height
 * above the eave vents, and whether it is an eave vent in the bottom third of the attic. The
 * 1/300 exceptions of IRC R806.2 depend on these [TRADE-REFERENCES §1].
 *
 * Assumptions, stated in the reasons whenever they are used:
 * - ridge, off-ridge and cupola vents sit at the ridge (drop 0 ft) unless a drop was recorded;
 * - eave vents (soffit, drip-edge, fascia) sit at the eave line, height 0 ft, so they are in the
 *   bottom third of the attic; any other low vent counts for the bottom third only when its height
 *   above the eave is known to be at most a third of the rise;
 * - a vent's rise is its own section's rise, or — if it names no section — the smallest rise of
 *   all sections (conservative), known only when every section has a roof form and pitch.
 */
import { sectionRiseFt, type SectionWithRoof } from "./attic-volume";
import type { Vent } from "./schema";
import { AT_RIDGE_KINDS, EAVE_KINDS } from "./vent-kinds";

export type DropSource = "recorded" | "at-ridge-kind" | "from-height-and-rise";
export type HeightSource = "recorded" | "from-drop-and-rise" | "eave-kind";

export interface VentPosition {
  ventId: string;
  riseFt: number | null;
  dropBelowRidgeFt: number | null;
  dropSource: DropSource | null;
  heightAboveEaveFt: number | null;
  heightSource: HeightSource | null;
  isEaveVent: boolean;
  /** In the bottom third of the attic height (2018+ rule). */
  isInBottomThird: boolean;
}

export function riseLookup(sections: ReadonlyArray<SectionWithRoof & { id?: string | undefined }>): (sectionId: string | undefined) => number | null {
  const byId = new Map<string, number | null>();
  let minRiseFt: number | null = null;
  let isEveryRiseKnown = sections.length > 0;
  for (const section of sections) {
    const riseFt = sectionRiseFt(section);
    if (section.id !== undefined) byId.set(section.id, riseFt);
    if (riseFt === null) isEveryRiseKnown = false;
    else minRiseFt = minRiseFt === null ? riseFt : Math.min(minRiseFt, riseFt);
  }
  return (sectionId) => (sectionId !== undefined && byId.has(sectionId) ? byId.get(sectionId)! : isEveryRiseKnown ? minRiseFt : null);
}

/**
 * @example
 * ventPosition({ id: "r1", kind: "ridge", location: "upper", lengthFt: 40, nfaSqInPerFt: 18 }, 7.5)
 * // { dropBelowRidgeFt: 0, dropSource: "at-ridge-kind", heightAboveEaveFt: 7.5, ... }
 */
export function ventPosition(vent: Vent, riseFt: number | null): VentPosition {
  const isEaveVent = EAVE_KINDS.has(vent.kind) && vent.location === "lower";
  let dropBelowRidgeFt: number | null = null;
  let dropSource: DropSource | null = null;
  if (vent.dropBelowRidgeFt !== undefined) {
    dropBelowRidgeFt = vent.dropBelowRidgeFt;
    dropSource = "recorded";
  } else if (AT_RIDGE_KINDS.has(vent.kind)) {
    dropBelowRidgeFt = 0;
    dropSource = "at-ridge-kind";
  } else if (vent.heightAboveEaveFt !== undefined && riseFt !== null) {
    dropBelowRidgeFt = Math.max(0, riseFt - vent.heightAboveEaveFt);
    dropSource = "from-height-and-rise";
  }

  let heightAboveEaveFt: number | null = null;
  let heightSource: HeightSource | null = null;
  if (vent.heightAboveEaveFt !== undefined) {
    heightAboveEaveFt = vent.heightAboveEaveFt;
    heightSource = "recorded";
  } else if (isEaveVent) {
    heightAboveEaveFt = 0;
    heightSource = "eave-kind";
  } else if (dropBelowRidgeFt !== null && riseFt !== null) {
    heightAboveEaveFt = Math.max(0, riseFt - dropBelowRidgeFt);
    heightSource = "from-drop-and-rise";
  }

  const isInBottomThird =
    vent.location === "lower" &&
    (isEaveVent || (heightAboveEaveFt !== null && riseFt !== null && heightAboveEaveFt <= riseFt / 3));

  return { ventId: vent.id, riseFt, dropBelowRidgeFt, dropSource, heightAboveEaveFt, heightSource, isEaveVent, isInBottomThird };
}
