/**
 * What an option fixes, for the homeowner's side-by-side choice: the problems found today that
 * the option's "after" analysis no longer reports, space by space, in the homeowner's titles.
 * "Good to know" findings are not problems, so they are neither fixed nor left; a shortfall the
 * option cures is not listed, since `meetsCode` says so in one line.
 */
import { homeownerFindings } from "./homeowner-words";
import type { SnapshotOption, SnapshotSpace } from "./types";

export interface OptionFixes {
  fixed: string[];
  /** Problems found today that remain after this option. */
  left: string[];
  /** Whether every space meets the code minimum after the work. */
  meetsCode: boolean;
}

const problems = (space: SnapshotSpace | undefined) => homeownerFindings(space?.analysis?.findings ?? []).filter((f) => f.severity !== "info");

/**
 * @example
 * optionFixes(before, { after: [{ spaceId: "s1", analysis: { findings: [], compliant: true, … } }], … })
 * // { fixed: ["Insulation is blocking the vents under the eaves"], left: [], meetsCode: true }
 */
export function optionFixes(before: readonly SnapshotSpace[], option: Pick<SnapshotOption, "after">): OptionFixes {
  const fixed: string[] = [];
  const left: string[] = [];
  const isSeveral = before.length > 1;
  for (const today of before) {
    const after = option.after.find((s) => s.spaceId === today.spaceId);
    const remaining = new Set(problems(after).map((f) => f.code));
    for (const f of problems(today)) {
      const words = isSeveral ? `${today.name}: ${f.title}` : f.title;
      const isFixed = Boolean(after?.analysis) && !remaining.has(f.code);
      // "Meets the building code minimum" already says the shortfall is gone.
      if (isFixed && f.code === "below-minimum" && after?.analysis?.compliant) continue;
      const list = isFixed ? fixed : left;
      if (!list.includes(words)) list.push(words);
    }
  }
  const meetsCode = option.after.length > 0 && option.after.every((s) => s.analysis?.compliant === true);
  return { fixed, left, meetsCode };
}
