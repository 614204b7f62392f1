import type { SaveState } from "@/lib/use-autosave";

const RANK: Record<SaveState["kind"], number> = { conflict: 6, error: 5, blocked: 4, offline: 3, saving: 2, saved: 1 };

/** The one state to show for the page: the most urgent of the project's and every space's. */
export function combineStates(states: SaveState[]): SaveState {
  return states.reduce<SaveState>((worst, s) => (RANK[s.kind] > RANK[worst.kind] ? s : worst), { kind: "saved" });
}
