/**
 * How a provided vent area stands against the range the code split wants: a check mark only
 * when it is inside the range, and words that say which way it misses (never ✓ beside a value
 * that is out of range, e.g. 540 sq in of exhaust where 289–360 is wanted).
 */
export type RangeStanding = "in-range" | "short" | "over";

/**
 * @example
 * rangeStanding(540, 289, 360) // "over"
 * rangeStanding(300, 289, 360) // "in-range"
 * rangeStanding(300, 720) // "in-range" (no upper bound)
 */
export function rangeStanding(valueSqIn: number, minSqIn: number, maxSqIn?: number): RangeStanding {
  if (valueSqIn < minSqIn) return "short";
  if (maxSqIn !== undefined && valueSqIn > maxSqIn) return "over";
  return "in-range";
}

/** The mark shown before the wanted range: ✓ in range, ! otherwise (with words, never colour alone). */
export function rangeMark(standing: RangeStanding): string {
  return standing === "in-range" ? "✓" : "!";
}

/** "more than the 289–360 sq in wanted" and the like, to follow the mark. */
export function rangeWords(standing: RangeStanding, wanted: string): string {
  if (standing === "short") return `less than the ${wanted} wanted`;
  if (standing === "over") return `more than the ${wanted} wanted`;
  return `${wanted} wanted`;
}
