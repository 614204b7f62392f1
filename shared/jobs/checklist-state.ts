import type { ChecklistItem } from "./types";

export interface Tick {
  itemId: string;
  photoCount: number;
}

/**
 * What still stands between the crew and "done": items not ticked, and airflow items without a
 * photo of the finished work. Empty means the job can be completed.
 *
 * @example
 * checklistProblems([{ id: "w1", isAirflowChange: true, … }], [{ itemId: "w1", photoCount: 0 }])
 * // [{ itemId: "w1", problem: "needs-photo" }]
 */
export function checklistProblems(items: readonly ChecklistItem[], ticks: readonly Tick[]): { itemId: string; problem: "not-ticked" | "needs-photo" }[] {
  const byId = new Map(ticks.map((t) => [t.itemId, t]));
  const problems: { itemId: string; problem: "not-ticked" | "needs-photo" }[] = [];
  for (const item of items) {
    const tick = byId.get(item.id);
    if (!tick) problems.push({ itemId: item.id, problem: "not-ticked" });
    else if (item.isAirflowChange && tick.photoCount === 0) problems.push({ itemId: item.id, problem: "needs-photo" });
  }
  return problems;
}
