/**
 * Where each passive vent sits, as far as the survey tells: its drop below the ridge, its height
 * above the eave vents, and whether it is an eave vent in the bottom third of the attic. The
 * 1/300 exceptions of IRC R806.2 depend on these [SOURCES.md §1].
 *
 * Assumptions, stated in the reasons whenever they are used:
 * - ridge, off-ridge and cupola vents sit at the ridge (drop 0 ft) unless a drop was recorded;
 * - eave vents (soffit, drip-edge, fascia) sit at the eave line, height 0 ft, so they are in the
 *   bottom third of the attic; any other low vent counts for the bottom third only when its height
 *   above the eave is known to be at most a third of the rise;
 * - a vent's rise is its own section's rise. A vent that names no section is measured the way that
 *   does not grant the 1/300 exception: its drop below "the ridge or highest point of the space"
 *   (IRC 2012+ R806.2 condition 2 [SOURCES.md S4]) from the HIGHEST rise of the space, and its height
 *   above the eave vents (IRC 2009 [S3]) and the bottom third (2018+) from the LOWEST rise; both are
 *   known only when every section has a roof form and pitch.
 * - a recorded height above the rise, or a drop below the ridge greater than the rise, is
 *   impossible: the vent's position is then unknown (not counted) and the survey is flagged.
 */
import { sectionRiseFt, type SectionWithRoof } from "./attic-volume";
import type { Vent } from "./schema";
import { AT_RIDGE_KINDS, EAVE_KINDS } from "./vent-kinds";

export type DropSource = "recorded" | "at-ridge-kind" | "from-height-and-rise";
export type HeightSource = "recorded" | "from-drop-and-rise" | "eave-kind";

/** The rise a vent is measured against: its own section's, or the space's highest and lowest. */
export interface RiseRange {
  highestFt: number;
  lowestFt: number;
}

export interface VentPosition {
  ventId: string;
  /** The highest rise the vent is measured against (its section's, or the space's highest). */
  riseFt: number | null;
  /** A recorded height or drop that can't be: above the rise of the space. */
  isHeightImpossible: boolean;
  dropBelowRidgeFt: number | null;
  dropSource: DropSource | null;
  heightAboveEaveFt: number | null;
  heightSource: HeightSource | null;
  isEaveVent: boolean;
  /** In the bottom third of the attic height (2018+ rule). */
  isInBottomThird: boolean;
}

export function riseLookup(sections: ReadonlyArray<SectionWithRoof & { id?: string | undefined }>): (sectionId: string | undefined) => RiseRange | null {
  const byId = new Map<string, RiseRange | null>();
  let lowestFt = Infinity;
  let highestFt = -Infinity;
  let isEveryRiseKnown = sections.length > 0;
  for (const section of sections) {
    const riseFt = sectionRiseFt(section);
    if (section.id !== undefined) byId.set(section.id, riseFt === null ? null : { highestFt: riseFt, lowestFt: riseFt });
    if (riseFt === null) isEveryRiseKnown = false;
    else {
      lowestFt = Math.min(lowestFt, riseFt);
      highestFt = Math.max(highestFt, riseFt);
    }
  }
  const whole: RiseRange | null = isEveryRiseKnown ? { highestFt, lowestFt } : null;
  return (sectionId) => (sectionId !== undefined && byId.has(sectionId) ? byId.get(sectionId)! : whole);
}

/**
 * @example
 * ventPosition({ id: "r1", kind: "ridge", location: "upper", lengthFt: 40, nfaSqInPerFt: 18 }, 7.5)
 * // { dropBelowRidgeFt: 0, dropSource: "at-ridge-kind", heightAboveEaveFt: 7.5, ... }
 */
export function ventPosition(vent: Vent, rise: RiseRange | number | null): VentPosition {
  const range: RiseRange | null = typeof rise === "number" ? { highestFt: rise, lowestFt: rise } : rise;
  const riseFt = range?.highestFt ?? null;
  const isEaveVent = EAVE_KINDS.has(vent.kind) && vent.location === "lower";
  const tolFt = 1e-9;
  const isHeightImpossible =
    range !== null &&
    ((vent.heightAboveEaveFt !== undefined && vent.heightAboveEaveFt > range.highestFt + tolFt) ||
      (vent.dropBelowRidgeFt !== undefined && vent.dropBelowRidgeFt > range.highestFt + tolFt));
  if (isHeightImpossible) {
    return { ventId: vent.id, riseFt, isHeightImpossible, dropBelowRidgeFt: null, dropSource: null, heightAboveEaveFt: null, heightSource: null, isEaveVent, isInBottomThird: false };
  }
  let dropBelowRidgeFt: number | null = null;
  let dropSource: DropSource | null = null;
  if (vent.dropBelowRidgeFt !== undefined) {
    dropBelowRidgeFt = vent.dropBelowRidgeFt;
    dropSource = "recorded";
  } else if (AT_RIDGE_KINDS.has(vent.kind)) {
    dropBelowRidgeFt = 0;
    dropSource = "at-ridge-kind";
  } else if (vent.heightAboveEaveFt !== undefined && range !== null) {
    dropBelowRidgeFt = Math.max(0, range.highestFt - vent.heightAboveEaveFt);
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
  } else if (dropBelowRidgeFt !== null && range !== null) {
    heightAboveEaveFt = Math.max(0, range.lowestFt - dropBelowRidgeFt);
    heightSource = "from-drop-and-rise";
  }

  const isInBottomThird =
    vent.location === "lower" &&
    (isEaveVent || (heightAboveEaveFt !== null && range !== null && heightAboveEaveFt <= range.lowestFt / 3));

  return { ventId: vent.id, riseFt, isHeightImpossible, dropBelowRidgeFt, dropSource, heightAboveEaveFt, heightSource, isEaveVent, isInBottomThird };
}
