/**
 * Free-area factors for site-built or unlabeled vent openings: NFA = gross opening ÷ factor.
 * Source: JLC "Roof Ventilation Field Guide" multiplier table [SOURCES.md §4, S11]; the
 * same numbers appear, from memory, in the classic USDA Forest Products Laboratory / FHA table
 * (AIB 373, AH 73) [from memory — not retrieved]. Labeled products state their own NFA, which wins.
 */

export type MeshSize = "1/4" | "1/8" | "1/16";

export type LouverMaterial = "wood" | "metal";

export interface Covering {
  mesh: MeshSize;
  /** Rain or wood louvers in front of the screen. */
  louvers: boolean;
  /**
   * What the louvers are made of. Only the 1/16 in screen row depends on it: "with or without plain
   * metal louvers" 2.00, wood louvers 3.00 [SOURCES.md S11]. Unrecorded → wood (the smaller NFA).
   */
  louverMaterial?: LouverMaterial | undefined;
}

/**
 * Factor by mesh: plain, with wood (rain) louvers, and with plain metal louvers [SOURCES.md S11;
 * S24 from memory for the USDA-FPL/FHA table]. The table has a metal-louver figure only for the
 * 1/16 in screen ("with or without plain metal louvers" 2.00); for the coarser meshes its louver
 * figure is used whatever the louvers are made of.
 */
export const COVERING_FACTORS: Readonly<Record<MeshSize, { plain: number; withLouvers: number; withMetalLouvers: number }>> = {
  "1/4": { plain: 1.0, withLouvers: 2.0, withMetalLouvers: 2.0 }, // 1/4 in hardware cloth
  "1/8": { plain: 1.25, withLouvers: 2.25, withMetalLouvers: 2.25 }, // 1/8 in mesh screen
  "1/16": { plain: 2.0, withLouvers: 3.0, withMetalLouvers: 2.0 }, // 1/16 in (#16) insect screen
};

/**
 * @example
 * coveringFactor({ mesh: "1/8", louvers: true }) // 2.25
 * coveringFactor({ mesh: "1/16", louvers: true, louverMaterial: "metal" }) // 2
 */
export function coveringFactor(covering: Covering): number {
  const row = COVERING_FACTORS[covering.mesh];
  if (!covering.louvers) return row.plain;
  return covering.louverMaterial === "metal" ? row.withMetalLouvers : row.withLouvers;
}

/** Plain words for a covering, e.g. "louvers with 1/8 in mesh". */
export function describeCovering(covering: Covering): string {
  const mesh = covering.mesh === "1/4" ? "1/4 in hardware cloth" : covering.mesh === "1/16" ? "1/16 in insect screen" : "1/8 in mesh";
  if (!covering.louvers) return mesh;
  if (covering.louverMaterial === "metal") return `metal louvers with ${mesh}`;
  if (covering.louverMaterial === "wood") return `wood louvers with ${mesh}`;
  return covering.mesh === "1/16" ? `louvers (material not recorded, taken as wood) with ${mesh}` : `louvers with ${mesh}`;
}

/**
 * Net free area of a gross opening behind a covering.
 *
 * @example
 * // SOURCES.md §8 E7: 14 × 24 in louver, louvers + 1/8 in mesh → 336 ÷ 2.25 = 149.33 sq in
 * netFreeAreaFromGrossSqIn(14 * 24, { mesh: "1/8", louvers: true }) // 149.333…
 */
export function netFreeAreaFromGrossSqIn(grossSqIn: number, covering: Covering): number {
  return grossSqIn / coveringFactor(covering);
}
